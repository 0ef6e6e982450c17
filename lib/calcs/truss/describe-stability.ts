import type { TrussSolution } from "../../solve";

/** m, r and j counted from the inputs, even when the truss turns out unstable. */
export type TrussCounts = { m: number; r: number; j: number };

/** Counts straight from the lists: 2 reactions per pin, 1 per roller. */
export function countFromInputs(lists: { joints: unknown[]; members: unknown[]; supports: { type: "pin" | "roller" }[] }): TrussCounts {
  return {
    m: lists.members.length,
    r: lists.supports.reduce((sum, s) => sum + (s.type === "pin" ? 2 : 1), 0),
    j: lists.joints.length,
  };
}

/**
 * Determinacy and stability in words, with the count written out, e.g.
 * "Stable and statically determinate: m + r = 2j (21 + 3 = 2 × 12)".
 */
export function describeStability(solution: TrussSolution): string {
  const { m, r, j } = solution.counts;
  if (solution.classification === "determinate") {
    return `Stable and statically determinate: m + r = 2j (${m} + ${r} = 2 × ${j})`;
  }
  const degree = m + r - 2 * j;
  return `Stable and statically indeterminate to degree ${degree}: m + r > 2j (${m} + ${r} = ${m + r} > 2 × ${j} = ${2 * j}); member forces depend on member stiffness`;
}
