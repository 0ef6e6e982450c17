import type { Comparison } from "./types";

/** Relative difference above which a hand result and the stiffness result are reported as disagreeing. */
export const AGREEMENT_TOLERANCE = 1e-6;

/**
 * Sets a hand-method value beside the stiffness value. The difference is
 * judged relative to the larger of the two values and `scale` (a typical
 * magnitude for the quantity), so values that are zero by statics compare
 * on the scale of the loads rather than on their own round-off.
 */
export function compareResults(method: number, stiffness: number, scale: number): Comparison {
  const difference = method - stiffness;
  const reference = Math.max(Math.abs(method), Math.abs(stiffness), Math.abs(scale));
  const agrees = Math.abs(difference) <= AGREEMENT_TOLERANCE * (reference > 0 ? reference : 1);
  return { method, stiffness, difference, agrees };
}
