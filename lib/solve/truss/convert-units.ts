import type { ForceUnit, LengthUnit, TrussModel } from "../types";

/** Metres per unit; ft and in are exact by definition (Source: NIST SP 811, Appendix B). */
const METRES: Record<LengthUnit, number> = { m: 1, mm: 0.001, ft: 0.3048, in: 0.0254 };
/** Newtons per unit; 1 lbf = 4.4482216152605 N, 1 kip = 1000 lbf (Source: NIST SP 811, Appendix B). */
const NEWTONS: Record<ForceUnit, number> = { kN: 1000, N: 1, kip: 4448.2216152605, lbf: 4.4482216152605 };

/** Target units; a missing one keeps the model's own. */
export type TrussUnits = { length?: LengthUnit; force?: ForceUnit };

/**
 * The same truss in other units: coordinates in length, loads in force,
 * A in length² and E in force/length², so that A·E/L and every result
 * convert consistently. The model's units default to kN and m. Roller
 * directions are unit-free and kept.
 */
export function convertTrussUnits(model: TrussModel, to: TrussUnits): TrussModel {
  const fromL = model.units?.length ?? "m";
  const fromF = model.units?.force ?? "kN";
  const toL = to.length ?? fromL;
  const toF = to.force ?? fromF;
  const l = METRES[fromL] / METRES[toL];
  const f = NEWTONS[fromF] / NEWTONS[toF];
  const scaled = (v: number | undefined, k: number) => (v === undefined ? undefined : v * k);
  return {
    units: { length: toL, force: toF },
    joints: model.joints.map((j) => ({ ...j, x: j.x * l, y: j.y * l })),
    members: model.members.map((m) => withoutUndefined({ ...m, A: scaled(m.A, l * l), E: scaled(m.E, f / (l * l)) })),
    supports: model.supports.map((s) => ({ ...s, ...(s.direction ? { direction: [s.direction[0], s.direction[1]] as [number, number] } : {}) })),
    loadCases: model.loadCases.map((c) => ({
      ...c,
      loads: c.loads.map((p) => withoutUndefined({ ...p, fx: scaled(p.fx, f), fy: scaled(p.fy, f) })),
    })),
  };
}

/** Drops keys whose value is undefined, so that optional fields stay absent rather than present-but-empty. */
function withoutUndefined<T extends object>(o: T): T {
  return Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined)) as T;
}
