import type { Step } from "@/lib/solve";

export type VisibleSteps = {
  /** The steps to show, each with its position in the full list (for numbering). */
  shown: { step: Step; index: number }[];
  /** How many steps of working are hidden. */
  hidden: number;
};

/** Collapsed, only the last step (the result) shows; expanded, all of them. */
export function visibleSteps(steps: readonly Step[], collapsed: boolean): VisibleSteps {
  const all = steps.map((step, index) => ({ step, index }));
  if (!collapsed || all.length <= 1) return { shown: all, hidden: 0 };
  return { shown: all.slice(-1), hidden: all.length - 1 };
}

/** The toggle's words: how much working a click reveals, or that it hides it. */
export function workingToggleLabel(steps: number, collapsed: boolean): string {
  if (!collapsed) return "Hide working";
  const n = Math.max(0, steps - 1);
  return `Show working (${n} ${n === 1 ? "step" : "steps"})`;
}
