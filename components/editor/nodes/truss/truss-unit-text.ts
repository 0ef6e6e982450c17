import type { TrussDraft } from "./truss-draft";

/** The units of a truss as printed in headers and results: "mm²", not the mathjs "mm^2". */
export type TrussUnitText = { length: string; force: string; area: string; modulus: string; lineLoad: string; moment: string };

/**
 * Unit words for a truss's chosen units. Sections follow the length unit
 * (mm² with metres, in² with feet) and moduli the force unit (GPa with kN,
 * ksi with kip), exactly as lib/calcs/truss reads them.
 */
export function trussUnitText(units: TrussDraft["units"]): TrussUnitText {
  const { length, force } = units;
  return {
    length,
    force,
    area: length === "m" ? "mm²" : "in²",
    modulus: force === "kN" ? "GPa" : "ksi",
    lineLoad: `${force}/${length}`,
    moment: `${force}·${length}`,
  };
}
