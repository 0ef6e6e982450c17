"use client";

import type { Editor } from "@tiptap/core";
import { useEffect, useState } from "react";
import { NewRemarkForm } from "./new-remark-form";
import { RemarkThreadCard } from "./remark-thread";
import type { CheckerChoice, RemarkDto, RemarkTarget, ReviewAbilities } from "./review-types";
import type { useReviewController } from "./use-review-controller";
import { selectionTarget } from "./use-review-controller";
import { WorkflowActions } from "./workflow-actions";

type Filter = "open" | "answered" | "closed";
const filters: { value: Filter; label: string }[] = [
  { value: "open", label: "Open" },
  { value: "answered", label: "Answered" },
  { value: "closed", label: "Closed" },
];

export type ReviewPanelProps = {
  editor: Editor | null;
  packageId: string;
  status: string;
  assignedChecker: string | null;
  checkers: CheckerChoice[];
  abilities: ReviewAbilities;
  calcLabels: Map<string, string>;
  controller: ReturnType<typeof useReviewController>;
};

/** The side panel of the review: progress and the next move, then the remarks by state, each one a click from its place. */
export function ReviewPanel({ editor, packageId, status, assignedChecker, checkers, abilities, calcLabels, controller }: ReviewPanelProps) {
  const { data, pending, setPending, highlighted, showRemark } = controller;
  const [filter, setFilter] = useState<Filter>("open");
  const issued = status === "issued";
  const counts = { open: 0, answered: 0, closed: 0 };
  for (const r of data.remarks) counts[r.state] += 1;
  const shown: RemarkDto[] = data.remarks.filter((r) => r.state === filter);

  // Showing a remark from the document switches to its list and brings its card into view.
  useEffect(() => {
    if (!highlighted) return;
    const r = data.remarks.find((x) => x.id === highlighted);
    if (r && r.state !== filter) setFilter(r.state);
    document.querySelector(`[data-testid="remark"][data-remark-id="${highlighted}"]`)?.scrollIntoView({ block: "nearest" });
  }, [highlighted]);

  const start = (target: RemarkTarget) => setPending(target);

  return (
    <div className="space-y-3" data-testid="review-panel">
      <WorkflowActions packageId={packageId} status={status} assignedChecker={assignedChecker} checkers={checkers} progress={data.progress} abilities={abilities} onChanged={data.refresh} />
      <section aria-label="Remarks" className="space-y-2">
        <div className="flex items-center gap-2">
          <h3 className="text-sm font-semibold">Remarks</h3>
          {abilities.canRemark && !issued && !pending && (
            <button type="button" className="pp-btn-quiet ml-auto px-2 py-0.5 text-xs" onClick={() => start(editor ? selectionTarget(editor) : { kind: "package" })}>
              New remark
            </button>
          )}
        </div>
        {pending && (
          <NewRemarkForm
            packageId={packageId}
            target={pending}
            onPickSelection={() => editor && setPending(selectionTarget(editor))}
            onCancel={() => setPending(null)}
            onCreated={() => {
              setPending(null);
              setFilter("open");
              data.refresh();
            }}
          />
        )}
        <div role="tablist" className="flex gap-1 text-xs">
          {filters.map((f) => (
            <button key={f.value} type="button" role="tab" aria-selected={filter === f.value} className={`rounded-sm border px-2 py-0.5 ${filter === f.value ? "border-ink bg-ink text-paper" : "border-rule-strong"}`} onClick={() => setFilter(f.value)}>
              {f.label} <span className="pp-num">{counts[f.value]}</span>
            </button>
          ))}
        </div>
        {shown.length === 0 ? (
          <p className="text-xs text-ink-faint">No {filter} remarks.</p>
        ) : (
          <ul className="space-y-2">
            {shown.map((r) => (
              <RemarkThreadCard
                key={r.id}
                packageId={packageId}
                remark={r}
                calcLabel={r.calcId ? calcLabels.get(r.calcId) : undefined}
                abilities={abilities}
                issued={issued}
                highlighted={highlighted === r.id}
                onShow={() => showRemark(r.id)}
                onChanged={data.refresh}
              />
            ))}
          </ul>
        )}
      </section>
    </div>
  );
}
