import type { UnitSystem } from "./formula-types";
import { dimsKey } from "./measure";

/** The units a kind of quantity is shown in; the first of each list is the one results are converted to. */
export type EngineeringUnits = {
  /** The kind of quantity in words, for messages ("moment", "stress"). */
  name: string;
  SI: readonly string[];
  US: readonly string[];
};

// Exponents in mathjs's base order: mass, length, time, current, temperature,
// luminous intensity, amount of substance, angle, bit.
function key(mass: number, length: number, time: number, angle = 0): string {
  return dimsKey([mass, length, time, 0, 0, 0, 0, angle, 0]);
}

/**
 * Engineering units by dimension. A result written in one of the listed units
 * (e.g. a length in mm) stays in it; any other result of that dimension is
 * converted to the first unit of the package's system (kN·m, MPa, kip·ft, ksi…).
 */
export const ENGINEERING_UNITS: ReadonlyMap<string, EngineeringUnits> = new Map([
  [key(0, 0, 0), { name: "plain number", SI: [""], US: [""] }],
  [key(1, 1, -2), { name: "force", SI: ["kN", "N", "MN"], US: ["kip", "lbf"] }],
  [key(1, 2, -2), { name: "moment", SI: ["kN*m", "N*mm", "N*m", "kN*mm", "MN*m"], US: ["kip*ft", "kip*in", "lbf*ft", "lbf*in"] }],
  [key(1, -1, -2), { name: "stress", SI: ["MPa", "GPa", "kPa", "Pa", "N/mm^2", "kN/m^2"], US: ["ksi", "psi", "ksf", "psf"] }],
  [key(1, 0, -2), { name: "force per length", SI: ["kN/m", "N/mm", "N/m"], US: ["kip/ft", "klf", "plf", "kip/in", "lbf/ft", "lbf/in"] }],
  [key(1, -2, -2), { name: "weight density", SI: ["kN/m^3"], US: ["pcf", "lbf/ft^3", "kip/ft^3"] }],
  [key(0, 1, 0), { name: "length", SI: ["m", "mm", "cm", "km"], US: ["ft", "in"] }],
  [key(0, 2, 0), { name: "area", SI: ["mm^2", "cm^2", "m^2"], US: ["in^2", "ft^2"] }],
  [key(0, 3, 0), { name: "length³ (section modulus, volume)", SI: ["mm^3", "cm^3", "m^3"], US: ["in^3", "ft^3"] }],
  [key(0, 4, 0), { name: "length⁴ (second moment of area)", SI: ["mm^4", "cm^4", "m^4"], US: ["in^4", "ft^4"] }],
  [key(0, 0, 0, 1), { name: "angle", SI: ["deg", "rad"], US: ["deg", "rad"] }],
  [key(1, 0, 0), { name: "mass", SI: ["kg", "t", "g"], US: ["lbm"] }],
  [key(1, -3, 0), { name: "density", SI: ["kg/m^3"], US: ["lbm/ft^3"] }],
  [key(0, 0, 1), { name: "time", SI: ["s", "min", "h"], US: ["s", "min", "h"] }],
  [key(0, 1, -2), { name: "acceleration", SI: ["m/s^2"], US: ["ft/s^2"] }],
]);

/** The engineering units for a dimension in a system, or undefined for dimensions outside the table. */
export function engineeringUnitsFor(dims: readonly number[], system: UnitSystem): readonly string[] | undefined {
  return ENGINEERING_UNITS.get(dimsKey(dims))?.[system];
}

/** The kind of quantity in words ("force"), or undefined outside the table. */
export function dimensionName(dims: readonly number[]): string | undefined {
  return ENGINEERING_UNITS.get(dimsKey(dims))?.name;
}
