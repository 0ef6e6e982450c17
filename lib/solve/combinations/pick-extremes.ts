import type { Combination } from "./types";

/** The combinations with the largest and the smallest value; the first listed wins a tie. */
export function pickExtremes<C extends Pick<Combination, "value">>(combinations: C[]): { max: C; min: C } {
  let max = combinations[0];
  let min = combinations[0];
  for (const c of combinations) {
    if (c.value > max.value) max = c;
    if (c.value < min.value) min = c;
  }
  return { max, min };
}
