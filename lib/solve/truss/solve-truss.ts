import { SolveError } from "../errors";
import { factorBandLdlt } from "../sparse/factor-band-ldlt";
import type { CaseResult, Step, TrussModel, TrussSolution } from "../types";
import { analyseStability } from "./analyse-stability";
import { assembleStiffness } from "./assemble-stiffness";
import { jointLoads } from "./joint-loads";
import { reactionSteps } from "./reaction-steps";
import { recoverCaseResult, type CaseSolveContext } from "./recover-case-result";
import { validateTruss } from "./validate-truss";

/**
 * Relative pivot below which the stiffness with the engineer's A and E is
 * singular. Far below the geometric mechanism test, because a legitimate mix
 * of very stiff and very soft members gives small pivots.
 */
const STIFFNESS_PIVOT_TOLERANCE = 1e-14;

/**
 * Reactions, member forces (tension positive) and, when every member has A
 * and E, joint displacements for every load case, by the 2D stiffness method
 * on a banded LDLᵀ factor shared by all cases. A determinate truss may omit A
 * and E: its forces follow from statics, so a unit axial stiffness stands in
 * and displacements are left out. An indeterminate truss needs A and E on
 * every member. Throws INVALID (bad input) or UNSTABLE (mechanism).
 */
export function solveTruss(model: TrussModel): TrussSolution {
  const clean = validateTruss(model);
  const analysis = analyseStability(clean);
  const { counts, index, geometry, dofs, coefficients } = analysis;
  const missing = clean.members.findIndex((mem) => mem.A === undefined || mem.E === undefined);
  if (missing >= 0 && counts.classification === "indeterminate") {
    const member = clean.members[missing];
    const field = member.A === undefined ? "A" : "E";
    throw new SolveError(
      "INVALID",
      `The truss is statically indeterminate (m + r = ${counts.m + counts.r} > 2j = ${2 * counts.j}), so its forces depend on member stiffness; member ${member.id} has no ${field === "A" ? "area A" : "modulus E"}.`,
      { path: `members[${missing}].${field}` },
    );
  }
  const withDisplacements = missing < 0;
  const axial = withDisplacements
    ? Float64Array.from(clean.members, (mem, e) => ((mem.A ?? 1) * (mem.E ?? 1)) / geometry.length[e])
    : new Float64Array(clean.members.length).fill(1);
  const factor = withDisplacements
    ? factorBandLdlt(assembleStiffness(coefficients, dofs, axial), { pivotTolerance: STIFFNESS_PIVOT_TOLERANCE })
    : analysis.unitFactor;
  if (factor.zeroPivots.length > 0) {
    const joints = [...new Set(factor.zeroPivots.map((row) => clean.joints[dofs.jointOf[row]].id))];
    throw new SolveError("UNSTABLE", `The stiffness equations are singular with these areas and moduli at joints ${joints.slice(0, 12).join(", ")}; check for members far stiffer or softer than the rest.`, { joints });
  }
  const ctx: CaseSolveContext = { model: clean, index, geometry, dofs, coefficients, factor, axial, withDisplacements };
  const cases: Record<string, CaseResult> = {};
  let steps: Step[] = [];
  clean.loadCases.forEach((loadCase, c) => {
    const loads = jointLoads(loadCase, index, clean.joints.length);
    cases[loadCase.id] = recoverCaseResult(ctx, loads);
    if (c === 0) steps = reactionSteps(clean, loads, cases[loadCase.id].reactions);
  });
  return { counts: { m: counts.m, r: counts.r, j: counts.j }, classification: counts.classification, cases, steps };
}
