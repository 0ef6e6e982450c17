import type { ForceUnit, LengthUnit, UnitSystem } from "../../solve";

/** The design standard's unit set for a truss, with factors from the truss's units to it. */
export type DesignUnits = {
  system: UnitSystem;
  force: string;
  length: string;
  stress: string;
  /** Truss force × this = design force. */
  forceFactor: number;
  /** Truss length × this = design length. */
  lengthFactor: number;
};

const NEWTONS: Record<ForceUnit, number> = { kN: 1000, N: 1, kip: 4448.2216152605, lbf: 4.4482216152605 };
const METRES: Record<LengthUnit, number> = { m: 1, mm: 0.001, ft: 0.3048, in: 0.0254 };

/**
 * Member checks run in the units their stresses are quoted in: N, mm, MPa for
 * an SI truss; kip, in, ksi for US steel; lbf, in, psi for US timber (NDS
 * design values are in psi).
 */
export function designUnits(truss: { force: ForceUnit; length: LengthUnit }, material: "steel-aisc360" | "steel-en1993" | "timber-nds"): DesignUnits {
  const si = truss.force === "kN" || truss.force === "N";
  const set = si
    ? { system: "N-mm" as const, force: "N" as const, length: "mm" as const, stress: "MPa" }
    : material === "timber-nds"
      ? { system: "lb-in" as const, force: "lbf" as const, length: "in" as const, stress: "psi" }
      : { system: "kip-in" as const, force: "kip" as const, length: "in" as const, stress: "ksi" };
  return {
    system: set.system,
    force: set.force,
    length: set.length,
    stress: set.stress,
    forceFactor: NEWTONS[truss.force] / NEWTONS[set.force],
    lengthFactor: METRES[truss.length] / METRES[set.length],
  };
}
