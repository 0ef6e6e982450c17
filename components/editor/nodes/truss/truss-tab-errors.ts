import type { CalcFieldError } from "@/lib/calcs/calc-types";

/** The input tabs of a Truss calc. */
export type TrussTab = "joints" | "members" | "supports" | "loads" | "generator";

/** Field errors sorted by the tab whose table shows them, and those no cell shows (listed on their own). */
export type TrussTabErrors = { counts: Record<TrussTab, number>; loose: CalcFieldError[] };

// The cells each table draws; an error anywhere else (a whole list, the units) has no field to sit on.
const ON_A_CELL: [TrussTab, RegExp][] = [
  ["joints", /^joints\[\d+\]\.(id|x|y)$/],
  ["members", /^members\[\d+\]\.(id|start|end|A|E)$/],
  ["supports", /^supports\[\d+\]\.(joint|type|direction)/],
  ["loads", /^loadCases\[\d+\]\.(id|kind)$/],
  ["loads", /^loadCases\[\d+\]\.loads\[\d+\]\.(joint|fx|fy)$/],
  ["loads", /^lineLoads\[\d+\]\.(case|chord|w|projected)/],
];

/**
 * Counts the errors each tab holds, so a tab can say "2 problems" and the
 * author finds the field; errors on no cell are kept whole for a list.
 */
export function trussTabErrors(errors: readonly CalcFieldError[]): TrussTabErrors {
  const counts: Record<TrussTab, number> = { joints: 0, members: 0, supports: 0, loads: 0, generator: 0 };
  const loose: CalcFieldError[] = [];
  for (const e of errors) {
    const hit = ON_A_CELL.find(([, re]) => re.test(e.path));
    if (hit) counts[hit[0]] += 1;
    else loose.push(e);
  }
  return { counts, loose };
}
