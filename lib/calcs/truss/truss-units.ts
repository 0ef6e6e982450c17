import type { ForceUnit, LengthUnit } from "../../solve";

/** Length units a Truss calc is entered in. */
export const trussLengthUnits = ["m", "ft"] as const;
/** Force units a Truss calc is entered in. */
export const trussForceUnits = ["kN", "kip"] as const;

/** The units of a Truss calc: SI (m, kN) or US customary (ft, kip). */
export type TrussUnitChoice = { length: (typeof trussLengthUnits)[number]; force: (typeof trussForceUnits)[number] };

/** Unit labels shown beside every value of a truss, readable by the Formula calc (mathjs syntax). */
export type TrussUnitLabels = {
  length: LengthUnit;
  force: ForceUnit;
  /** Section area as entered: mm² with metres, in² with feet. */
  area: "mm^2" | "in^2";
  /** Elastic modulus as entered: GPa with kN, ksi with kip. */
  modulus: "GPa" | "ksi";
  /** Displacements and deflections as shown: mm with metres, in with feet. */
  displacement: "mm" | "in";
  /** Line loads: force per length. */
  lineLoad: string;
  /** Moments: force × length. */
  moment: string;
};

/** Labels plus the factors that bring entered values to the solver's consistent units (length, force). */
export type TrussUnits = TrussUnitLabels & {
  /** Entered area × this = length². */
  areaToModel: number;
  /** Entered modulus × this = force / length². */
  modulusToModel: number;
  /** Model length × this = displacement unit. */
  lengthToDisplacement: number;
};

/** Metres and newtons per unit; ft, in and lbf exact by definition (NIST SP 811, Appendix B). */
const METRES = { m: 1, ft: 0.3048, mm: 0.001, in: 0.0254 } as const;
const NEWTONS = { kN: 1000, kip: 4448.2216152605 } as const;
/** Pascals per GPa and per ksi (1 ksi = 1 kip / in²). */
const PASCALS = { GPa: 1e9, ksi: 4448.2216152605 / (0.0254 * 0.0254) } as const;

/**
 * Labels and conversion factors for a truss's units. Sections are entered in
 * the units engineers quote (mm², GPa; in², ksi) and converted here so the
 * solver sees one consistent set (A·E/L in force per length).
 */
export function trussUnits(choice: TrussUnitChoice): TrussUnits {
  const L = METRES[choice.length];
  const F = NEWTONS[choice.force];
  const area = choice.length === "m" ? "mm^2" : "in^2";
  const modulus = choice.force === "kN" ? "GPa" : "ksi";
  const displacement = choice.length === "m" ? "mm" : "in";
  const areaSide = choice.length === "m" ? METRES.mm : METRES.in;
  return {
    length: choice.length,
    force: choice.force,
    area,
    modulus,
    displacement,
    lineLoad: `${choice.force}/${choice.length}`,
    moment: `${choice.force}*${choice.length}`,
    areaToModel: (areaSide * areaSide) / (L * L),
    modulusToModel: (PASCALS[modulus] * L * L) / F,
    lengthToDisplacement: L / METRES[displacement],
  };
}
