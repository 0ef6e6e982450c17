import { combineCases, isSolveError, SolveError, type CombineCasesResult } from "../../solve";
import type { CalcValue, ForceEnvelope, TrussValue } from "../calc-types";
import { errorEvaluation } from "../error-evaluation";
import { exportName } from "../export-name";
import { computedEvaluation, failedEvaluation, type KindEvaluation } from "../kind-evaluation";
import { quantityValue } from "../quantity-value";
import { readTrussValue } from "../read-truss-value";
import type { CombinationsInputs } from "./combinations-inputs";
import type { CombinationsView, Extreme } from "./combinations-view";
import { combinedTruss, type FactorSet } from "./combined-truss";

/**
 * Applies a published combination set (or custom factors) to the referenced
 * truss's member forces and reactions, finds the governing combination of
 * each, and exports `N_<member>_max` / `_min`, `R_<joint>_<x|y>_max` / `_min`
 * and, as `model`, the truss with every combination added as a case.
 */
export function evaluateCombinations(inputs: CombinationsInputs, resolved: Record<string, CalcValue>): KindEvaluation<CombinationsView> {
  const truss = readTrussValue(resolved, inputs.truss);
  if (!truss || truss.combinations.length > 0) {
    return failedEvaluation({ fieldErrors: [{ path: "truss", message: `${inputs.truss} is not a Truss calc; combinations are formed from a Truss calc's load cases.` }] });
  }
  if (truss.cases.length === 0) return failedEvaluation({ fieldErrors: [{ path: "truss", message: `${inputs.truss} has no load cases to combine.` }] });
  const force = truss.model.units?.force ?? "kN";
  const cases = truss.cases.map((id) => ({ id, kind: truss.caseKinds?.[id] ?? id, ...(inputs.psi0?.[id] === undefined ? {} : { psi0: inputs.psi0[id] }) }));
  const first = truss.solution.cases[truss.cases[0]];
  const memberKeys = Object.keys(first.forces).map((m) => [m, `N_${m}`] as const);
  const reactionKeys = Object.keys(first.reactions).flatMap((j) => (["x", "y"] as const).map((c) => [j, c, `R_${j}_${c}`] as const));
  const results = Object.fromEntries(
    truss.cases.map((id) => {
      const r = truss.solution.cases[id];
      const row: Record<string, number> = {};
      for (const [m, key] of memberKeys) row[key] = r.forces[m];
      for (const [j, c, key] of reactionKeys) row[key] = c === "x" ? r.reactions[j].rx : r.reactions[j].ry;
      return [id, row];
    }),
  );
  const clash = (inputs.custom ?? []).findIndex((s) => truss.cases.includes(s.name));
  if (inputs.standard === "custom" && clash >= 0) {
    return failedEvaluation({ fieldErrors: [{ path: `custom[${clash}].name`, message: `"${inputs.custom?.[clash].name}" is also a load case of ${inputs.truss}; give the combination its own name.` }] });
  }
  let combined: CombineCasesResult;
  try {
    combined =
      inputs.standard === "custom"
        ? combineCases({ factorSets: inputs.custom ?? [], cases, results, units: force })
        : combineCases({ standard: inputs.standard, cases, results, units: force });
  } catch (e) {
    return errorEvaluation(rephrase(e, inputs, truss), { fields: ["standard", "custom", "psi0", "truss"] });
  }
  const extreme = (key: string, sense: "max" | "min"): Extreme => {
    const e = combined.envelope[key][sense];
    return { value: e.value, combination: e.name };
  };
  const envelope: Record<string, ForceEnvelope> = Object.fromEntries(memberKeys.map(([m, key]) => [m, { max: extreme(key, "max"), min: extreme(key, "min") }]));
  const sets = new Map<string, FactorSet>();
  for (const c of combined.combinations) sets.set(c.name, { name: c.name, factors: c.factors });
  for (const e of Object.values(combined.envelope)) for (const x of [e.max, e.min]) if (!sets.has(x.name)) sets.set(x.name, { name: x.name, factors: x.factors });
  const value = combinedTruss(truss, [...sets.values()], envelope);

  const exports: Record<string, CalcValue> = { model: value };
  for (const [m] of memberKeys) {
    exports[exportName("N", m, "max")] = quantityValue(envelope[m].max.value, force);
    exports[exportName("N", m, "min")] = quantityValue(envelope[m].min.value, force);
  }
  for (const [j, c, key] of reactionKeys) {
    exports[exportName("R", j, c, "max")] = quantityValue(combined.envelope[key].max.value, force);
    exports[exportName("R", j, c, "min")] = quantityValue(combined.envelope[key].min.value, force);
  }
  const view: CombinationsView = {
    truss: inputs.truss,
    standard: inputs.standard,
    cases: cases.map((c) => ({ id: c.id, kind: c.kind })),
    combinations: combined.combinations.map((c) => ({ name: c.name, source: c.source, factors: c.factors })),
    members: memberKeys.map(([m]) => ({ member: m, ...envelope[m] })),
    reactions: reactionKeys.map(([joint, component, key]) => ({ joint, component, max: extreme(key, "max"), min: extreme(key, "min") })),
    units: { force },
  };
  return computedEvaluation({ exports, steps: combined.steps, view });
}

/** The core's paths name its own options (`cases[1].kind`, `factorSets[0]…`); say them in this calc's terms. */
function rephrase(e: unknown, inputs: CombinationsInputs, truss: TrussValue): unknown {
  if (!isSolveError(e) || !e.path) return e;
  const kind = /^cases\[(\d+)\]\.kind$/.exec(e.path);
  if (kind) {
    const id = truss.cases[Number(kind[1])];
    const allowed = inputs.standard.startsWith("EN") ? "G, Q, S, W" : "D, L, Lr, S, R, W";
    return new SolveError("INVALID", `Load case ${id} of ${inputs.truss} is of kind "${truss.caseKinds?.[id] ?? id}", which ${inputs.standard} does not combine (it takes ${allowed}); change the case's kind or use custom factors.`, { path: "standard" });
  }
  if (e.path.startsWith("factorSets")) return new SolveError("INVALID", e.message.replace(/^factorSets/, "custom"), { path: e.path.replace(/^factorSets/, "custom") });
  return e;
}
