import { plainQty } from "./plain-qty";
import { forceSymbol } from "./force-symbol";
import { tensionOrCompression, texQty } from "../latex";
import type { Step } from "../types";

/**
 * The closing line for one unknown: F = numerator / denominator = value,
 * tension or compression. `denominator` is omitted when it is 1 so the line
 * does not carry an empty fraction, and the middle is dropped when it is the result.
 */
export function solvedForceStep(memberId: string, numerator: string, denominator: string | null, value: number, forceUnit: string): Step {
  const sense = tensionOrCompression(value, 0);
  const word = sense === "zero" ? "zero force" : sense;
  const result = texQty(value, forceUnit);
  const middle = denominator === null ? numerator : `\\dfrac{${numerator}}{${denominator}}`;
  // A middle that already reads as the result would only repeat it.
  const chain = middle === result ? result : `${middle} = ${result}`;
  return {
    latex: `${forceSymbol(memberId)} = ${chain}\\quad\\text{(${word})}`,
    text: `${memberId} = ${plainQty(value, forceUnit)}, ${word}.`,
  };
}
