import { compareResults } from "../geometry/compare-results";
import { comparisonStep } from "../geometry/comparison-step";
import { forceSymbol } from "../geometry/force-symbol";
import type { Comparison } from "../geometry/types";
import { escapeTex } from "../latex";
import type { Step, TrussModel } from "../types";
import { balanceJoint, type JointBalance } from "./balance-joint";
import { checkKnownForces } from "./check-known-forces";
import { jointContext, type JointContext } from "./joint-context";
import { jointUnknowns } from "./joint-unknowns";

/** Which load case to work through joint by joint. */
export type SolveByJointsOptions = {
  loadCase: string;
  /** Member forces found beforehand (e.g. by a section where the joints got stuck), carried in from the start. */
  known?: Record<string, number>;
};

/** Where the joint-by-joint sequence could not go on. */
export type JointsStuck = {
  /** "indeterminate": more unknowns than equations; "needs a section": determinate, but no joint has two or fewer unknowns. */
  reason: "indeterminate" | "needs a section";
  /** Members still unknown. */
  members: string[];
  /** Remaining joints with unknowns, each with its count. */
  joints: Array<{ joint: string; unknowns: number }>;
  message: string;
};

/** A sequence of joint solutions and what it found. */
export type SolveByJointsResult = {
  /** Joints in the order they were solved. */
  order: string[];
  /** Every member force found (and those given in `known`), tension positive. */
  forces: Record<string, number>;
  /** Working per solved joint, in order. */
  joints: JointBalance[];
  /** Joints left over once every force is known: each is a check (ΣFx, ΣFy). */
  checks: JointBalance[];
  complete: boolean;
  stuck?: JointsStuck;
  comparison: Record<string, Comparison>;
  /** True when complete, every check balances and every force agrees with the stiffness solution. */
  agrees: boolean;
  steps: Step[];
};

/**
 * Method of joints for the whole truss, greedy: repeatedly take the first
 * joint (model order) with one or two unknown member forces that ΣFx and ΣFy
 * can separate. Reactions come from the full solution, so support joints can
 * start the sequence.
 */
export function solveByJoints(model: TrussModel, options: SolveByJointsOptions): SolveByJointsResult {
  const given = options.known ?? {};
  checkKnownForces(model, given);
  const ctx = jointContext(model, options.loadCase);
  const forces: Record<string, number> = { ...given };
  const solved: JointBalance[] = [];
  for (;;) {
    const next = model.joints.find((j) => {
      const m = jointUnknowns(ctx, j.id, forces);
      return m.unknown.length >= 1 && m.unknown.length <= 2 && !m.collinear;
    });
    if (!next) break;
    const balance = balanceJoint(ctx, next.id, forces);
    Object.assign(forces, balance.forces);
    solved.push(balance);
  }
  const visited = new Set(solved.map((b) => b.joint));
  const missing = model.members.filter((m) => !Object.hasOwn(forces, m.id)).map((m) => m.id);
  const complete = missing.length === 0;
  const checks = complete ? model.joints.filter((j) => !visited.has(j.id)).map((j) => balanceJoint(ctx, j.id, forces)) : [];
  const stuck = complete ? undefined : describeStuck(ctx, forces, missing);
  const steps: Step[] = [
    {
      latex: `\\text{Method of joints, load case } \\mathrm{${escapeTex(options.loadCase)}}`,
      text: `Method of joints, load case ${options.loadCase}: joints are taken in an order where each has at most two unknown member forces; reactions from the full solution; members assumed in tension.${Object.keys(given).length ? ` Known beforehand: ${Object.keys(given).join(", ")}.` : ""}`,
    },
    ...solved.flatMap((b) => b.steps),
    ...checks.flatMap((b) => b.steps),
  ];
  if (stuck) steps.push({ latex: `\\text{Stopped: ${stuck.reason}}`, text: stuck.message });
  const comparison: Record<string, Comparison> = {};
  for (const [id, v] of Object.entries(forces)) {
    if (Object.hasOwn(given, id)) continue;
    const stiffness = ctx.result.forces[id];
    if (!Number.isFinite(stiffness)) continue;
    comparison[id] = compareResults(v, stiffness, ctx.scale);
    steps.push(comparisonStep(forceSymbol(id), id, "joints", comparison[id], ctx.units.force));
  }
  const agrees = complete && checks.every((c) => c.balanced) && solved.every((b) => b.balanced) && Object.values(comparison).every((c) => c.agrees);
  return { order: solved.map((b) => b.joint), forces, joints: solved, checks, complete, stuck, comparison, agrees, steps };
}

function describeStuck(ctx: JointContext, forces: Record<string, number>, missing: string[]): JointsStuck {
  const joints = ctx.model.joints
    .map((j) => ({ joint: j.id, unknowns: jointUnknowns(ctx, j.id, forces).unknown.length }))
    .filter((j) => j.unknowns > 0);
  const reason = ctx.solution.classification === "indeterminate" ? "indeterminate" : "needs a section";
  const where = joints.map((j) => `${j.joint} (${j.unknowns})`).join(", ");
  const message =
    reason === "indeterminate"
      ? `Stopped with ${missing.length} member forces unknown (${missing.join(", ")}): the truss is statically indeterminate, so equilibrium alone cannot find them. Remaining joints and their unknowns: ${where}.`
      : `Stopped with ${missing.length} member forces unknown (${missing.join(", ")}): every remaining joint has three or more unknowns (or two on one line). Cut a section to find one of them, then carry on by joints. Remaining joints and their unknowns: ${where}.`;
  return { reason, members: missing, joints, message };
}
