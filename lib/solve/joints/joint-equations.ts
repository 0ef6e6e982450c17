import { forceSymbol } from "../geometry/force-symbol";
import { joinTerms, type SignedTerm } from "../geometry/join-terms";
import { escapeTex, texNum, texQty } from "../latex";
import type { JointContext } from "./joint-context";
import type { JointMembers } from "./joint-unknowns";

/** ΣF along one axis at a joint: Σ coefficient·F(unknown) + constant = 0. */
export type AxisEquation = {
  axis: "x" | "y";
  /** Sum of loads, reactions and known member forces along the axis. */
  constant: number;
  /** Direction cosine of each unknown (same order as JointMembers.unknown). */
  coefficients: number[];
  /** The equation with numbers in, e.g. ΣFx = 0: 0.6 F_AB + F_AC + 15 kN = 0. */
  latex: string;
};

/** Cosines this small are zero: members exactly along an axis would otherwise show a 1e-17 term. */
const NEGLIGIBLE = 1e-12;

/**
 * Writes ΣFx = 0 and ΣFy = 0 at a joint. Loads and reactions enter with their
 * sign; each member force acts along the member away from the joint
 * (tension positive), so it enters as its direction cosine times the force.
 */
export function jointEquations(ctx: JointContext, joint: string, members: JointMembers): [AxisEquation, AxisEquation] {
  const loads = ctx.loadCase.loads.filter((l) => l.joint === joint);
  const reaction = ctx.result.reactions[joint];
  const f = ctx.units.force;
  const j = escapeTex(joint);
  const build = (axis: "x" | "y"): AxisEquation => {
    const terms: SignedTerm[] = [];
    let constant = 0;
    const coefficients = members.unknown.map((u) => clean(u.axis.direction[axis]));
    members.unknown.forEach((u, i) => {
      const c = coefficients[i];
      if (c !== 0) terms.push({ negative: c < 0, tex: `${cosine(c)}${forceSymbol(u.id)}` });
    });
    for (const k of members.known) {
      const c = clean(k.axis.direction[axis]);
      if (c === 0 || k.force === 0) continue;
      constant += c * k.force;
      const q = texQty(k.force, f);
      terms.push({ negative: c < 0, tex: `${cosine(c)}${k.force < 0 ? `(${q})` : q}` });
    }
    for (const l of loads) {
      const v = (axis === "x" ? l.fx : l.fy) ?? 0;
      if (v === 0) continue;
      constant += v;
      terms.push({ negative: v < 0, tex: texQty(Math.abs(v), f) });
    }
    const r = reaction ? (axis === "x" ? reaction.rx : reaction.ry) : 0;
    if (r !== 0) {
      constant += r;
      terms.push({ negative: r < 0, tex: `${texQty(Math.abs(r), f)}\\ (R_{${axis},\\mathrm{${j}}})` });
    }
    return { axis, constant, coefficients, latex: `\\sum F_{${axis}} = 0:\\quad ${joinTerms(terms)} = 0` };
  };
  return [build("x"), build("y")];
}

function clean(c: number): number {
  return Math.abs(c) < NEGLIGIBLE ? 0 : c;
}

/** The magnitude of a direction cosine as a factor, left out when it is 1. */
function cosine(c: number): string {
  return Math.abs(Math.abs(c) - 1) < NEGLIGIBLE ? "" : `${texNum(Math.abs(c))}\\,`;
}
