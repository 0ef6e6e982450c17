import type { TrussValue } from "@/lib/calcs/calc-types";
import { isSolveError, solveTruss, type Step } from "@/lib/solve";

/**
 * The global-equilibrium steps for the reactions of one case. The runtime
 * writes them for the first case; for another, the truss is solved again
 * with that case alone (first), which is what the steps are written from.
 * A model that solved once solves again, so a failure here is a bug to show.
 */
export function caseSteps(value: TrussValue, firstSteps: readonly Step[], caseId: string): Step[] {
  const cases = value.model.loadCases;
  if (cases.length === 0 || cases[0].id === caseId) return [...firstSteps];
  const only = cases.find((c) => c.id === caseId);
  if (!only) return [];
  try {
    return solveTruss({ ...value.model, loadCases: [only] }).steps ?? [];
  } catch (e) {
    if (!isSolveError(e)) throw e;
    return [{ latex: "\\text{Steps not available}", text: `The steps for case ${caseId} could not be written: ${e.message}` }];
  }
}
