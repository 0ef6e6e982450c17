import { SolveError } from "../errors";
import { compareResults } from "../geometry/compare-results";
import { comparisonStep } from "../geometry/comparison-step";
import { forceSymbol } from "../geometry/force-symbol";
import type { Comparison } from "../geometry/types";
import type { Step, TrussModel } from "../types";
import { balanceJoint } from "./balance-joint";
import { checkKnownForces } from "./check-known-forces";
import { jointContext } from "./joint-context";

/** One joint to balance, with any member forces already found elsewhere. */
export type JointEquilibriumOptions = {
  loadCase: string;
  joint: string;
  /** Member forces already known (tension positive); members not at the joint are ignored. */
  known?: Record<string, number>;
};

/** The forces found at the joint and the working. */
export type JointEquilibriumResult = {
  /** Forces of the members that were unknown at the joint, tension positive. */
  forces: Record<string, number>;
  /** The members that were unknown. */
  unknowns: string[];
  /** ΣFx and ΣFy with every force in. */
  residual: { x: number; y: number };
  /** True when the joint balances within round-off (a check on `known`). */
  balanced: boolean;
  /** Each found force beside the stiffness solution's. */
  comparison: Record<string, Comparison>;
  /** True when every found force agrees with the stiffness solution and the joint balances. */
  agrees: boolean;
  steps: Step[];
};

/**
 * Method of joints at one joint: loads and reactions (from the full solution)
 * and the known member forces are carried in; at most two unknowns remain.
 */
export function jointEquilibrium(model: TrussModel, options: JointEquilibriumOptions): JointEquilibriumResult {
  if (!model.joints.some((j) => j.id === options.joint)) {
    throw new SolveError("INVALID", `Joint ${options.joint} is not in the truss.`, { path: "joint" });
  }
  const known = options.known ?? {};
  checkKnownForces(model, known);
  const ctx = jointContext(model, options.loadCase);
  const balance = balanceJoint(ctx, options.joint, known);
  const steps = [...balance.steps];
  const comparison: Record<string, Comparison> = {};
  for (const id of balance.unknowns) {
    const stiffness = ctx.result.forces[id];
    if (!Number.isFinite(stiffness)) continue;
    comparison[id] = compareResults(balance.forces[id], stiffness, ctx.scale);
    steps.push(comparisonStep(forceSymbol(id), id, "joint", comparison[id], ctx.units.force));
  }
  const agrees = balance.balanced && Object.values(comparison).every((c) => c.agrees);
  return { forces: balance.forces, unknowns: balance.unknowns, residual: balance.residual, balanced: balance.balanced, comparison, agrees, steps };
}
