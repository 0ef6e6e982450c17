"use client";

import { useState } from "react";
import { toast } from "sonner";
import { useCalcReview } from "./review-context";
import { formatWhen } from "./format-when";

/**
 * The checker's strip on every calc: the current mark with name and time, a
 * notice when a later input change cleared the mark, the open remarks on it,
 * and the checker's buttons.
 */
export function CalcCheckBar({ calcId, label }: { calcId: string; label: string }) {
  const review = useCalcReview(calcId);
  const [busy, setBusy] = useState(false);
  if (!review) return null;
  const { check, remarks, abilities, status } = review;
  const open = remarks.filter((r) => r.state !== "closed");
  const inCheck = status === "in_check" || status === "checked";

  async function mark(state: "checked" | "returned") {
    setBusy(true);
    try {
      await review!.markCalc(calcId, state);
      toast.success(state === "checked" ? `${label} marked checked.` : `${label} returned to the engineer.`);
    } catch (e) {
      toast.error(e instanceof Error ? e.message : "Could not mark the calc.");
    } finally {
      setBusy(false);
    }
  }

  return (
    <div className="flex flex-wrap items-center gap-2 border-b border-rule bg-paper-sunk/60 px-3 py-1 text-xs" data-testid="calc-check" data-check-state={check?.state ?? "unchecked"} data-check-cleared={check?.cleared ? "true" : "false"}>
      {check?.state === "checked" && <span className="font-medium text-verdigris-dark">✓ Checked by {check.checkerName} · {formatWhen(check.at)}</span>}
      {check?.state === "returned" && <span className="font-medium text-compression">↩ Returned by {check.checkerName} · {formatWhen(check.at)}</span>}
      {(!check || check.state === "unchecked") && !check?.cleared && <span className="text-ink-soft">Not checked yet</span>}
      {check?.cleared && <span className="font-medium text-caution" role="status">Check mark cleared: the inputs changed after it was marked — check again.</span>}
      {open.length > 0 && (
        <button type="button" className="text-caution underline underline-offset-2" onClick={() => review.showRemark(open[0].id)}>
          {open.length} open remark{open.length === 1 ? "" : "s"}
        </button>
      )}
      <span className="ml-auto flex gap-1.5">
        {abilities.canRemark && status !== "issued" && (
          <button type="button" className="pp-btn-quiet px-2 py-0.5 text-xs" onClick={() => review.startRemark({ kind: "calc", calcId, label })}>
            Remark on {label}
          </button>
        )}
        {abilities.canCheck && inCheck && (
          <>
            <button type="button" className="pp-btn-quiet px-2 py-0.5 text-xs" disabled={busy} onClick={() => mark("checked")} aria-label={`Mark ${label} checked`}>
              Mark checked
            </button>
            <button type="button" className="pp-btn-quiet px-2 py-0.5 text-xs" disabled={busy} onClick={() => mark("returned")} aria-label={`Return ${label}`}>
              Return
            </button>
          </>
        )}
      </span>
    </div>
  );
}
