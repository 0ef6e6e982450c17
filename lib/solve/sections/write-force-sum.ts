import { forceSymbol } from "../geometry/force-symbol";
import { joinTerms, type SignedTerm } from "../geometry/join-terms";
import { plainQty } from "../geometry/plain-qty";
import { snapToZero } from "../geometry/snap-to-zero";
import type { ExternalForce, ModelUnits, Point } from "../geometry/types";
import { texNum, texQty } from "../latex";
import type { Step } from "../types";
import type { CutMember } from "./cut-member";
import { solvedForceStep } from "../geometry/solved-force-step";

/** What a force sum across two parallel cut members needs. */
export type ForceSumInput = {
  unknown: CutMember;
  /** Unit normal to the parallel members; the sum is taken along it. */
  normal: Point;
  /** Component of the unknown's assumed-tension direction along `normal`. */
  coefficient: number;
  /** The parallel cut members, which have no component along `normal`. */
  eliminated: string[];
  external: ExternalForce[];
  units: ModelUnits;
  /** Force scale of the case; results below a billionth of it are round-off. */
  forceScale: number;
};

/**
 * ΣF perpendicular to the parallel members, which do not appear in it. When
 * the normal is vertical or horizontal the sum is written as ΣFy or ΣFx,
 * which is how a checker expects to see a shear equation in a parallel-chord
 * panel.
 */
export function writeForceSum(input: ForceSumInput): { value: number; steps: Step[] } {
  const { normal, coefficient, unknown, units } = input;
  const axis = Math.abs(normal.x) < 1e-12 ? "y" : Math.abs(normal.y) < 1e-12 ? "x" : "\\perp";
  const terms: SignedTerm[] = [];
  let known = 0;
  for (const f of input.external) {
    const c = f.fx * normal.x + f.fy * normal.y;
    if (Math.abs(c) < 1e-12 * Math.max(Math.abs(f.fx), Math.abs(f.fy))) continue;
    known += c;
    terms.push({ negative: c < 0, tex: texQty(Math.abs(c), units.force) });
  }
  const k = Math.abs(coefficient);
  const unity = Math.abs(k - 1) < 1e-12;
  terms.push({ negative: coefficient < 0, tex: unity ? forceSymbol(unknown.id) : `${texNum(k)}\\,${forceSymbol(unknown.id)}` });
  const value = snapToZero(-known / coefficient, input.forceScale);
  const numerator = texQty(coefficient < 0 ? known : -known, units.force);
  const direction =
    axis === "\\perp"
      ? `along (${plainQty(normal.x)}, ${plainQty(normal.y)}), perpendicular to ${input.eliminated.join(" and ")}`
      : `in the +${axis} direction, perpendicular to ${input.eliminated.join(" and ")}`;
  return {
    value,
    steps: [
      {
        latex: `\\sum F_{${axis}} = 0:\\quad ${joinTerms(terms)} = 0`,
        text: `Sum of forces ${direction}, which therefore drop out.${unity ? "" : ` ${unknown.id} has a component of ${plainQty(k)} of its force in that direction.`}`,
      },
      solvedForceStep(unknown.id, numerator, unity ? null : texNum(k), value, units.force),
    ],
  };
}
