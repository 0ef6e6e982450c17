"use client";

import { memo, useId, useState } from "react";
import type { Step } from "@/lib/solve";
import { Tex } from "./tex";
import { visibleSteps, workingToggleLabel } from "./visible-steps";

export type StepListProps = {
  steps: readonly Step[];
  /** Controlled: collapsed to the last step (the result). Leave undefined to let the list keep its own state. */
  collapsed?: boolean;
  /** Called with the new state when the reader toggles. */
  onToggle?: (collapsed: boolean) => void;
  /** Starting state when uncontrolled; default shows the working. */
  defaultCollapsed?: boolean;
  className?: string;
};

/**
 * A calc's working, one typeset line per step with the same line in words under
 * it, numbered so a checker can cite "step 4". It collapses to the result.
 */
export const StepList = memo(function StepList({ steps, collapsed, onToggle, defaultCollapsed = false, className }: StepListProps) {
  const [own, setOwn] = useState(defaultCollapsed);
  const listId = useId();
  const isCollapsed = collapsed ?? own;
  if (steps.length === 0) return null;
  const { shown } = visibleSteps(steps, isCollapsed);
  const toggle = () => {
    const next = !isCollapsed;
    if (collapsed === undefined) setOwn(next);
    onToggle?.(next);
  };

  return (
    <div className={className} data-step-list="">
      {steps.length > 1 && (
        <button type="button" className="pp-btn-quiet mb-2 px-2 py-0.5 text-xs" aria-expanded={!isCollapsed} aria-controls={listId} onClick={toggle}>
          {workingToggleLabel(steps.length, isCollapsed)}
        </button>
      )}
      <ol id={listId} start={shown[0].index + 1} className="list-decimal space-y-2 pl-8 marker:font-mono marker:text-xs marker:text-ink-faint">
        {shown.map(({ step, index }) => (
          <li key={index} data-step={index + 1}>
            {/* A long line scrolls on its own rather than widening the page; the number marker stays outside it. */}
            <div className="overflow-x-auto">
              <Tex latex={step.latex} display />
            </div>
            {step.text && <p className="mt-0.5 text-xs text-ink-soft">{step.text}</p>}
          </li>
        ))}
      </ol>
    </div>
  );
});
