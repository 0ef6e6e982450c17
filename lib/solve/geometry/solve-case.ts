import { SolveError } from "../errors";
import { solveTruss } from "../truss";
import type { CaseResult, LoadCase, TrussModel, TrussSolution } from "../types";
import { findLoadCase } from "./find-load-case";

/** The full stiffness solution of a model and the one case a hand method works on. */
export type SolvedCase = { solution: TrussSolution; loadCase: LoadCase; result: CaseResult };

/**
 * Solves the whole truss once. The hand methods take their reactions from it
 * (so an indeterminate support layout works too) and compare against its
 * member forces and displacements.
 */
export function solveCase(model: TrussModel, loadCaseId: string): SolvedCase {
  const loadCase = findLoadCase(model, loadCaseId);
  const solution = solveTruss(model);
  const result = solution.cases[loadCaseId];
  if (!result) {
    throw new SolveError("INVALID", `The truss solution has no results for load case "${loadCaseId}".`, { path: "loadCase" });
  }
  return { solution, loadCase, result };
}
