import type { CaseResult, JointLoad, TrussModel } from "../../solve";
import type { ForceEnvelope, TrussValue } from "../calc-types";

/** A combination to add to the truss as a case: its name and a factor per case id. */
export type FactorSet = { name: string; factors: Record<string, number> };

/**
 * The truss with each combination added as a load case (factored loads
 * summed per joint) and its results by superposition, which is exact for the
 * linear solution; downstream calcs can then work on a combination as on a case.
 */
export function combinedTruss(truss: TrussValue, sets: FactorSet[], envelope: Record<string, ForceEnvelope>): TrussValue {
  const loadCases = [...truss.model.loadCases];
  const cases: Record<string, CaseResult> = { ...truss.solution.cases };
  const names: string[] = [];
  for (const set of sets) {
    if (Object.hasOwn(cases, set.name)) continue;
    names.push(set.name);
    loadCases.push({ id: set.name, loads: factoredLoads(truss.model, set.factors) });
    cases[set.name] = superpose(truss, set.factors);
  }
  const model: TrussModel = { ...truss.model, loadCases };
  return { ...truss, model, solution: { ...truss.solution, cases }, combinations: names, envelope };
}

function factoredLoads(model: TrussModel, factors: Record<string, number>): JointLoad[] {
  const totals = new Map<string, { fx: number; fy: number }>();
  for (const c of model.loadCases) {
    const k = factors[c.id] ?? 0;
    if (k === 0) continue;
    for (const load of c.loads) {
      const t = totals.get(load.joint) ?? { fx: 0, fy: 0 };
      t.fx += k * (load.fx ?? 0);
      t.fy += k * (load.fy ?? 0);
      totals.set(load.joint, t);
    }
  }
  return [...totals].map(([joint, t]) => ({ joint, fx: t.fx + 0, fy: t.fy + 0 }));
}

function superpose(truss: TrussValue, factors: Record<string, number>): CaseResult {
  const ids = truss.cases.filter((id) => (factors[id] ?? 0) !== 0);
  const first = truss.solution.cases[truss.cases[0]];
  const sum = (pick: (r: CaseResult) => number) => ids.reduce((s, id) => s + factors[id] * pick(truss.solution.cases[id]), 0) + 0;
  const out: CaseResult = {
    reactions: Object.fromEntries(Object.keys(first.reactions).map((j) => [j, { rx: sum((r) => r.reactions[j].rx), ry: sum((r) => r.reactions[j].ry) }])),
    forces: Object.fromEntries(Object.keys(first.forces).map((m) => [m, sum((r) => r.forces[m])])),
  };
  if (first.displacements) {
    const d = first.displacements;
    out.displacements = Object.fromEntries(
      Object.keys(d).map((j) => [j, { ux: sum((r) => r.displacements?.[j]?.ux ?? 0), uy: sum((r) => r.displacements?.[j]?.uy ?? 0) }]),
    );
  }
  return out;
}
