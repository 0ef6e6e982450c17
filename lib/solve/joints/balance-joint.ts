import { SolveError } from "../errors";
import { plainQty } from "../geometry/plain-qty";
import { snapToZero } from "../geometry/snap-to-zero";
import { solvedForceStep } from "../geometry/solved-force-step";
import { escapeTex, texNum, texNumParen, texQty } from "../latex";
import type { Step } from "../types";
import type { JointContext } from "./joint-context";
import { jointEquations, type AxisEquation } from "./joint-equations";
import { jointUnknowns } from "./joint-unknowns";

/** Equilibrium of one joint: the forces found, the working, and how well both equations balance afterwards. */
export type JointBalance = {
  joint: string;
  /** Members whose forces were found here (at most two). */
  unknowns: string[];
  /** Forces found at this joint, tension positive. */
  forces: Record<string, number>;
  /** ΣFx and ΣFy with every force in; zero up to round-off for a consistent set of known forces. */
  residual: { x: number; y: number };
  /** True when both residuals are within round-off of the case's force scale. */
  balanced: boolean;
  steps: Step[];
};

/**
 * Solves ΣFx = 0 and ΣFy = 0 at `joint` for at most two unknown member forces.
 * Where one equation holds a single unknown it is solved first and the result
 * substituted, as on paper; otherwise the pair is solved together.
 */
export function balanceJoint(ctx: JointContext, joint: string, known: Record<string, number>): JointBalance {
  const members = jointUnknowns(ctx, joint, known);
  const ids = members.unknown.map((u) => u.id);
  if (ids.length > 2) {
    throw new SolveError("UNSOLVABLE_CUT", `Joint ${joint} has ${ids.length} unknown member forces (${ids.join(", ")}); ΣFx and ΣFy can find at most two.`);
  }
  if (members.collinear) {
    throw new SolveError("UNSOLVABLE_CUT", `At joint ${joint} the unknown members ${ids.join(" and ")} lie on one line, so ΣFx and ΣFy cannot separate their forces; find one of them first (e.g. by a section).`);
  }
  const [ex, ey] = jointEquations(ctx, joint, members);
  const steps: Step[] = [
    {
      latex: `\\text{Joint } \\mathrm{${escapeTex(joint)}}`,
      text: `Joint ${joint}: ${ids.length ? `unknown ${ids.join(", ")} assumed in tension (pulling away from the joint)` : "no unknown member forces"}${members.known.length ? `; known ${members.known.map((k) => `${k.id} = ${plainQty(k.force, ctx.units.force)}`).join(", ")} carried in` : ""}.`,
    },
    { latex: ex.latex, text: `Sum of horizontal forces at ${joint}, positive to the right.` },
    { latex: ey.latex, text: `Sum of vertical forces at ${joint}, positive upwards.` },
  ];
  const values = solve(ids, ex, ey, ctx.units.force, steps, ctx.scale);
  const forces: Record<string, number> = {};
  ids.forEach((id, i) => (forces[id] = values[i]));
  const residual = {
    x: ex.constant + ex.coefficients.reduce((s, c, i) => s + c * values[i], 0),
    y: ey.constant + ey.coefficients.reduce((s, c, i) => s + c * values[i], 0),
  };
  // Round-off grows with the largest force in play, not only with the loads.
  const magnitude = Math.max(ctx.scale, ...members.known.map((k) => Math.abs(k.force)), ...values.map(Math.abs));
  const limit = 1e-6 * (magnitude > 0 ? magnitude : 1);
  const balanced = Math.abs(residual.x) <= limit && Math.abs(residual.y) <= limit;
  // An equation not used to find a force is a free check on the known forces and reactions.
  for (const eq of [ex, ey]) {
    if (usedEquations(ids.length, ex, ey).includes(eq.axis)) continue;
    const r = eq.axis === "x" ? residual.x : residual.y;
    const ok = Math.abs(r) <= limit;
    steps.push({
      latex: `\\sum F_{${eq.axis}} = ${texQty(r, ctx.units.force)}\\ ${ok ? "\\approx 0\\ \\checkmark" : "\\neq 0"}`,
      text: ok ? `ΣF${eq.axis} at ${joint} balances: a check on the forces carried in.` : `ΣF${eq.axis} at ${joint} is out of balance by ${plainQty(r, ctx.units.force)}: the forces carried in are not consistent.`,
    });
  }
  return { joint, unknowns: ids, forces, residual, balanced, steps };
}

/** Which equations the solution uses: both for two unknowns, the one with the larger cosine for one. */
function usedEquations(n: number, ex: AxisEquation, ey: AxisEquation): Array<"x" | "y"> {
  if (n === 2) return ["x", "y"];
  if (n === 0) return [];
  return Math.abs(ex.coefficients[0]) >= Math.abs(ey.coefficients[0]) ? ["x"] : ["y"];
}

function solve(ids: string[], ex: AxisEquation, ey: AxisEquation, unit: string, steps: Step[], scale: number): number[] {
  if (ids.length === 0) return [];
  if (ids.length === 1) {
    const eq = usedEquations(1, ex, ey)[0] === "x" ? ex : ey;
    return [single(ids[0], eq.coefficients[0], eq.constant, unit, steps, `ΣF${eq.axis}`, scale)];
  }
  // Prefer an equation in which one unknown is absent (a member along an axis): solve it, then substitute.
  for (const [first, second] of [[ex, ey], [ey, ex]] as const) {
    for (const k of [0, 1]) {
      const other = 1 - k;
      if (first.coefficients[other] !== 0 || first.coefficients[k] === 0) continue;
      const vk = single(ids[k], first.coefficients[k], first.constant, unit, steps, `ΣF${first.axis}`, scale);
      const vo = substituted(ids[other], second, other, k, vk, unit, steps, `ΣF${second.axis} with ${ids[k]} substituted`, scale);
      return k === 0 ? [vk, vo] : [vo, vk];
    }
  }
  const [ax, bx] = ex.coefficients;
  const [ay, by] = ey.coefficients;
  const det = ax * by - bx * ay;
  const a = snapToZero((bx * ey.constant - by * ex.constant) / det, scale);
  const b = snapToZero((ay * ex.constant - ax * ey.constant) / det, scale);
  const S = (v: number) => `(${texQty(v, unit)})`;
  const den = `${texNumParen(ax)}${texNumParen(by)} - ${texNumParen(bx)}${texNumParen(ay)}`;
  steps.push(
    { ...solvedForceStep(ids[0], `${texNumParen(bx)}${S(ey.constant)} - ${texNumParen(by)}${S(ex.constant)}`, den, a, unit), text: `Solving ΣFx and ΣFy together: ${ids[0]} = ${plainQty(a, unit)}.` },
    { ...solvedForceStep(ids[1], `${texNumParen(ay)}${S(ex.constant)} - ${texNumParen(ax)}${S(ey.constant)}`, den, b, unit), text: `Solving ΣFx and ΣFy together: ${ids[1]} = ${plainQty(b, unit)}.` },
  );
  return [a, b];
}

/** c·F + constant = 0 solved for F, written as F = −constant / c. */
function single(id: string, c: number, constant: number, unit: string, steps: Step[], from: string, scale: number): number {
  const value = snapToZero(-constant / c, scale);
  const unity = Math.abs(Math.abs(c) - 1) < 1e-12;
  const step = solvedForceStep(id, texQty(c < 0 ? constant : -constant, unit), unity ? null : texNum(Math.abs(c)), value, unit);
  steps.push({ latex: step.latex, text: `From ${from}: ${step.text}` });
  return value;
}

/** The second equation solved after substituting the first result: F = −(constant + c_k·F_k) / c. */
function substituted(
  id: string, eq: AxisEquation, self: number, known: number, value: number, unit: string, steps: Step[], from: string, scale: number,
): number {
  const c = eq.coefficients[self];
  const ck = eq.coefficients[known];
  const result = snapToZero(-(eq.constant + ck * value) / c, scale);
  const parts: string[] = [];
  if (eq.constant !== 0) parts.push(texQty(eq.constant, unit));
  if (ck !== 0) parts.push(`${parts.length && ck > 0 ? "+ " : ""}${ck < 0 ? "-" : ""}${texNum(Math.abs(ck))}\,${texQtyParen(value, unit)}`);
  const numerator = `-\\left[${parts.join(" ") || "0"}\\right]`;
  const unity = Math.abs(c - 1) < 1e-12;
  const step = solvedForceStep(id, numerator, unity ? null : texNum(c), result, unit);
  steps.push({ latex: step.latex, text: `From ${from}: ${step.text}` });
  return result;
}

function texQtyParen(v: number, unit: string): string {
  const q = texQty(v, unit);
  return v < 0 ? `(${q})` : q;
}
