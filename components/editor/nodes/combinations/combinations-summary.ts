import type { CombinationsView as CombinationsViewData } from "@/lib/calcs/combinations/combinations-view";
import { forceSenseText } from "./force-sense-text";
import { formatQuantity } from "./format-figure";

/**
 * The result line: how many combinations, and the largest member force of
 * any of them with its member and combination — what the reader looks for first.
 */
export function combinationsSummary(view: CombinationsViewData, setName: string): string {
  const count = `${view.combinations.length} ${view.combinations.length === 1 ? "combination" : "combinations"} (${setName})`;
  let top: { member: string; value: number; combination: string } | null = null;
  for (const m of view.members) {
    // Symmetric members differ only by round-off: the first in the list is kept, so the line does not flip between them as loads change.
    for (const e of [m.max, m.min]) if (!top || Math.abs(e.value) > Math.abs(top.value) * (1 + 1e-9)) top = { member: m.member, value: e.value, combination: e.combination };
  }
  if (!top) return count;
  return `${count}; largest member force ${top.member} ${formatQuantity(top.value, view.units.force)} (${forceSenseText(top.value)}) by ${top.combination}`;
}
