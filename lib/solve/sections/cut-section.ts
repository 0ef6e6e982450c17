import { SolveError } from "../errors";
import { classifyPoint } from "../geometry/classify-point";
import { compareResults } from "../geometry/compare-results";
import { comparisonStep } from "../geometry/comparison-step";
import { externalForces } from "../geometry/external-forces";
import { forceScale } from "../geometry/force-scale";
import { forceSymbol } from "../geometry/force-symbol";
import { indexJoints } from "../geometry/index-joints";
import { lengthTolerance } from "../geometry/length-tolerance";
import { modelUnits } from "../geometry/model-units";
import { solveCase } from "../geometry/solve-case";
import type { Comparison, ExternalForce, PivotKind, Point } from "../geometry/types";
import { escapeTex } from "../latex";
import type { Step, TrussModel } from "../types";
import { describePivot } from "./describe-pivot";
import { freeBodyStep } from "./free-body-step";
import { planEquation } from "./plan-equation";
import { resolveCut } from "./resolve-cut";
import { writeForceSum } from "./write-force-sum";
import { writeMomentEquation } from "./write-moment-equation";

/** A section through the truss: which members are cut and which side is kept as the free body. */
export type CutSectionOptions = {
  /** Load case whose loads and reactions act on the free body. */
  loadCase: string;
  /** The two or three members the section cuts. */
  members: string[];
  /** Any joint on the side kept as the free body. */
  keep: string;
};

/** The worked section: forces in the cut members, how each was found, and the check against the stiffness solution. */
export type CutSectionResult = {
  /** Joints of the free body, in model order. */
  keptJoints: string[];
  /** Force in each cut member, tension positive. */
  forces: Record<string, number>;
  /** Moment point used for each member; null where a force sum across two parallel members was used. */
  pivots: Record<string, Point | null>;
  /** What each moment point is (joint, support, off-truss point); null for a force sum. */
  pivotKind: Record<string, PivotKind | null>;
  /** Loads and reactions on the free body. */
  externalForces: ExternalForce[];
  /** Each cut member's force beside the stiffness solution's. */
  comparison: Record<string, Comparison>;
  /** True when every cut member agrees with the stiffness solution within round-off. */
  agrees: boolean;
  steps: Step[];
};

/**
 * Method of sections: takes the free body on the `keep` side of the cut, with
 * reactions from the full solution, and finds each cut member's force from
 * one equation that contains only that member.
 */
export function cutSection(model: TrussModel, options: CutSectionOptions): CutSectionResult {
  // Solving first also validates the model, so a cut is only judged on a sound truss.
  const { loadCase, result } = solveCase(model, options.loadCase);
  const joints = indexJoints(model);
  const { keptJoints, otherJoints, cut } = resolveCut(model, joints, options.members, options.keep);
  const units = modelUnits(model);
  const tol = lengthTolerance(model);
  const external = externalForces(loadCase, result, new Set(keptJoints));
  const names = cut.map((c) => c.id);
  const steps: Step[] = [
    {
      latex: `\\text{Cut } ${names.map(forceSymbol).join(",\\ ")};\\ \\text{free body: } ${keptJoints.map((j) => `\\mathrm{${escapeTex(j)}}`).join(",\\ ")}`,
      text: `Section through ${names.join(", ")}, load case ${loadCase.id}; the free body is the side with joints ${keptJoints.join(", ")} (the other side, ${otherJoints.join(", ")}, is removed). Reactions are taken from the full solution of the truss.`,
    },
    {
      latex: "\\circlearrowleft\\ M > 0,\\quad \\text{cut members assumed in tension}",
      text: "Sign convention: moments counter-clockwise positive; each cut member is assumed in tension, pulling away from the free body, so a negative result is compression.",
    },
    freeBodyStep(external, units, "the free body"),
  ];
  const scale = forceScale(loadCase, result);
  const forces: Record<string, number> = {};
  const pivots: Record<string, Point | null> = {};
  const pivotKind: Record<string, PivotKind | null> = {};
  let offTruss = 0;
  cut.forEach((unknown, index) => {
    const plan = planEquation(cut, index, tol);
    const eliminated = names.filter((_, i) => i !== index);
    if (plan.kind === "unsolvable") throw new SolveError("UNSOLVABLE_CUT", plan.reason);
    if (plan.kind === "force sum") {
      const eq = writeForceSum({ unknown, normal: plan.normal, coefficient: plan.coefficient, eliminated, external, units, forceScale: scale });
      forces[unknown.id] = eq.value;
      pivots[unknown.id] = null;
      pivotKind[unknown.id] = null;
      steps.push(...eq.steps);
      return;
    }
    const kind = classifyPoint(model, plan.pivot);
    if (kind.kind === "off-truss point") offTruss += 1;
    const pivot = describePivot(kind, plan.pivot, offTruss, keptJoints, eliminated, units);
    if (pivot.step) steps.push(pivot.step);
    const eq = writeMomentEquation({
      unknown, pivot: plan.pivot, arm: plan.arm, pivotLabel: pivot.label, pivotWords: pivot.words,
      eliminated, external, joints, units, lengthTol: tol, forceScale: scale,
    });
    forces[unknown.id] = eq.value;
    pivots[unknown.id] = plan.pivot;
    pivotKind[unknown.id] = kind;
    steps.push(...eq.steps);
  });
  const comparison: Record<string, Comparison> = {};
  for (const id of names) {
    const stiffness = result.forces[id];
    if (!Number.isFinite(stiffness)) continue;
    comparison[id] = compareResults(forces[id], stiffness, scale);
    steps.push(comparisonStep(forceSymbol(id), id, "section", comparison[id], units.force));
  }
  const agrees = Object.values(comparison).every((c) => c.agrees);
  return { keptJoints, forces, pivots, pivotKind, externalForces: external, comparison, agrees, steps };
}
