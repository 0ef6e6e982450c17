"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { toast } from "sonner";
import { fetchJson } from "@/lib/client/fetch-json";
import type { CheckerChoice, CheckProgressDto, ReviewAbilities } from "./review-types";

export type WorkflowActionsProps = {
  packageId: string;
  status: string;
  assignedChecker: string | null;
  checkers: CheckerChoice[];
  progress: CheckProgressDto | undefined;
  abilities: ReviewAbilities;
  onChanged: () => void;
};

/** Check progress in words, and the next move each role may make from the package's state. */
export function WorkflowActions({ packageId, status, assignedChecker, checkers, progress, abilities, onChanged }: WorkflowActionsProps) {
  const router = useRouter();
  const [checkerId, setCheckerId] = useState(assignedChecker ?? "");
  const [busy, setBusy] = useState(false);
  const assignedName = checkers.find((c) => c.userId === assignedChecker)?.name;

  async function act(url: string, method: string, body: unknown, done: string) {
    setBusy(true);
    try {
      await fetchJson(url, { method, body });
      toast.success(done);
      onChanged();
      router.refresh();
    } catch (e) {
      toast.error(e instanceof Error ? e.message : "Could not do that.", { duration: 8000 });
    } finally {
      setBusy(false);
    }
  }

  return (
    <section className="space-y-2 rounded-sm border border-rule bg-paper-raised p-2.5 text-sm" aria-label="Check and issue">
      {progress && (
        <p data-testid="check-progress" data-checked={progress.checked} data-total={progress.total} data-open-remarks={progress.openRemarks}>
          <span className="pp-num font-semibold">{progress.checked} of {progress.total}</span> calcs checked ·{" "}
          <span className="pp-num font-semibold">{progress.openRemarks}</span> open remark{progress.openRemarks === 1 ? "" : "s"}
        </p>
      )}
      <p className="text-xs text-ink-soft">Checker: {assignedName ?? "not assigned"}</p>
      {abilities.canAssign && status !== "issued" && (
        <div className="flex gap-1.5">
          <select className="pp-input py-0.5 text-xs" aria-label="Checker" value={checkerId} onChange={(e) => setCheckerId(e.target.value)}>
            <option value="">Choose a checker…</option>
            {checkers.map((c) => (
              <option key={c.userId} value={c.userId}>{c.name}</option>
            ))}
          </select>
          <button type="button" className="pp-btn-quiet px-2 py-0.5 text-xs" disabled={busy || !checkerId || checkerId === assignedChecker} onClick={() => act(`/api/v1/packages/${packageId}/checker`, "PUT", { checkerId }, "Checker assigned.")}>
            Assign
          </button>
        </div>
      )}
      <div className="flex flex-wrap gap-1.5">
        {abilities.canSubmit && status === "draft" && (
          <button type="button" className="pp-btn px-2 py-1 text-xs" disabled={busy} onClick={() => act(`/api/v1/packages/${packageId}/submit`, "POST", undefined, "Submitted for check; the checker has been told.")}>
            Submit for check
          </button>
        )}
        {abilities.canIssue && (status === "in_check" || status === "checked") && (
          <button type="button" className="pp-btn px-2 py-1 text-xs" disabled={busy} onClick={() => act(`/api/v1/packages/${packageId}/revisions`, "POST", undefined, "Revision issued and frozen.")}>
            Issue revision
          </button>
        )}
        {abilities.canStartNext && status === "issued" && (
          <button type="button" className="pp-btn-quiet px-2 py-1 text-xs" disabled={busy} onClick={() => act(`/api/v1/packages/${packageId}/next-revision`, "POST", undefined, "The next revision is open as a draft.")}>
            Start next revision
          </button>
        )}
      </div>
    </section>
  );
}
