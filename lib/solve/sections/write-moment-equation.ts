import { forceSymbol } from "../geometry/force-symbol";
import { joinTerms, type SignedTerm } from "../geometry/join-terms";
import { plainQty } from "../geometry/plain-qty";
import { snapToZero } from "../geometry/snap-to-zero";
import type { ExternalForce, ModelUnits, Point } from "../geometry/types";
import { texQty } from "../latex";
import type { Joint, Step } from "../types";
import type { CutMember } from "./cut-member";
import { solvedForceStep } from "../geometry/solved-force-step";

/** What a moment equation about one point needs. */
export type MomentEquationInput = {
  unknown: CutMember;
  pivot: Point;
  /** Signed arm of the unknown's assumed-tension line of action about the pivot (CCW positive). */
  arm: number;
  /** LaTeX subscript naming the pivot, e.g. \mathrm{U3} or P_{1}. */
  pivotLabel: string;
  /** Words naming the pivot, e.g. "joint U3" or "point P1". */
  pivotWords: string;
  /** The other cut members, whose lines pass through the pivot. */
  eliminated: string[];
  external: ExternalForce[];
  joints: Map<string, Joint>;
  units: ModelUnits;
  lengthTol: number;
  /** Force scale of the case; results below a billionth of it are round-off. */
  forceScale: number;
};

/**
 * ΣM about the pivot written term by term as force × perpendicular distance,
 * counter-clockwise positive, then solved for the unknown. Each load or
 * reaction is split into its x and y components because their arms are then
 * plain coordinate differences a checker can read off the drawing.
 */
export function writeMomentEquation(input: MomentEquationInput): { value: number; steps: Step[] } {
  const { unknown, pivot, arm, units } = input;
  const terms: SignedTerm[] = [];
  let known = 0;
  for (const f of input.external) {
    const at = input.joints.get(f.joint);
    if (!at) continue;
    const dy = at.y - pivot.y;
    const dx = at.x - pivot.x;
    // A horizontal component turns the body clockwise when it acts above the pivot pointing right.
    const parts: Array<[number, number]> = [[f.fx, -dy], [f.fy, dx]];
    for (const [force, lever] of parts) {
      if (force === 0 || Math.abs(lever) <= input.lengthTol) continue;
      const moment = force * lever;
      known += moment;
      terms.push({ negative: moment < 0, tex: `${texQty(Math.abs(force), units.force)} \\times ${texQty(Math.abs(lever), units.length)}` });
    }
  }
  terms.push({ negative: arm < 0, tex: `${forceSymbol(unknown.id)} \\times ${texQty(Math.abs(arm), units.length)}` });
  const value = snapToZero(-known / arm, input.forceScale);
  const flip = arm < 0;
  const numerator = texQty(flip ? known : -known, units.moment);
  const denominator = texQty(Math.abs(arm), units.length);
  return {
    value,
    steps: [
      {
        latex: `\\sum M_{${input.pivotLabel}} = 0:\\quad ${joinTerms(terms)} = 0`,
        text: `Moments about ${input.pivotWords}, counter-clockwise positive; ${input.eliminated.join(" and ")} ${input.eliminated.length > 1 ? "pass" : "passes"} through it and ${input.eliminated.length > 1 ? "drop" : "drops"} out. ${unknown.id} acts at ${plainQty(Math.abs(arm), units.length)} from it.`,
      },
      solvedForceStep(unknown.id, numerator, denominator, value, units.force),
    ],
  };
}
