import type { TrussDraft } from "./truss-draft";

// Exact by definition (NIST SP 811, Appendix B): 1 ft = 0.3048 m, 1 lbf = 4.4482216152605 N.
const METRES_PER = { m: 1, ft: 0.3048 } as const;
const KN_PER = { kN: 1, kip: 4.4482216152605 } as const;
/** Square metres per mm² and per in². */
const AREA = { m: 1e-6, ft: 0.0254 * 0.0254 } as const;
/** Pascals per GPa and per ksi (1 ksi = 1 kip / in²). */
const MODULUS = { kN: 1e9, kip: 4448.2216152605 / (0.0254 * 0.0254) } as const;

const scale = (v: number | undefined, k: number) => (v === undefined ? undefined : v * k);

/**
 * The same truss in other units: every length, force, area, modulus and
 * line load converted, so changing the units never changes the structure.
 * Reaction-line directions are ratios and stay as they are.
 */
export function convertDraftUnits(draft: TrussDraft, to: TrussDraft["units"]): TrussDraft {
  const from = draft.units;
  const L = METRES_PER[from.length] / METRES_PER[to.length];
  const F = KN_PER[from.force] / KN_PER[to.force];
  const A = AREA[from.length] / AREA[to.length];
  const E = MODULUS[from.force] / MODULUS[to.force];
  const out: TrussDraft = {
    ...draft,
    units: to,
    joints: draft.joints.map((j) => ({ ...j, x: scale(j.x, L), y: scale(j.y, L) })),
    members: draft.members.map((m) => ({ ...m, A: scale(m.A, A), E: scale(m.E, E) })),
    loadCases: draft.loadCases.map((c) => ({ ...c, loads: c.loads.map((l) => ({ ...l, fx: scale(l.fx, F), fy: scale(l.fy, F) })) })),
  };
  if (draft.lineLoads) out.lineLoads = draft.lineLoads.map((l) => ({ ...l, w: scale(l.w, F / L) }));
  if (draft.generator) {
    const g = draft.generator;
    out.generator = { ...g, span: g.span * L, ...(g.depth === undefined ? {} : { depth: g.depth * L }), ...(g.rise === undefined ? {} : { rise: g.rise * L }) };
  }
  return out;
}
