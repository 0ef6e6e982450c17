"use client";

import { useState } from "react";
import { toast } from "sonner";
import { fetchJson } from "@/lib/client/fetch-json";
import { formatWhen } from "./format-when";
import type { RemarkDto, ReviewAbilities } from "./review-types";

const stateWords = { open: "Open", answered: "Answered", closed: "Closed" } as const;

export type RemarkThreadProps = {
  packageId: string;
  remark: RemarkDto;
  calcLabel: string | undefined;
  abilities: ReviewAbilities;
  issued: boolean;
  highlighted: boolean;
  onShow: () => void;
  onChanged: () => void;
};

/** One remark: what it is on, the thread, a reply box and — for whoever may — Close. */
export function RemarkThreadCard({ packageId, remark, calcLabel, abilities, issued, highlighted, onShow, onChanged }: RemarkThreadProps) {
  const [reply, setReply] = useState("");
  const [busy, setBusy] = useState(false);
  const mayClose = remark.state !== "closed" && !issued && (abilities.canCloseAny || (abilities.canCloseOwn && remark.openedBy === abilities.userId));

  async function send(url: string, body: unknown, done: string) {
    setBusy(true);
    try {
      await fetchJson(url, { method: "POST", body });
      toast.success(done);
      setReply("");
      onChanged();
    } catch (e) {
      toast.error(e instanceof Error ? e.message : "Could not save.");
    } finally {
      setBusy(false);
    }
  }

  const target = remark.detached
    ? remark.calcId
      ? "Detached: its calc was deleted"
      : "Detached: the quoted text was deleted"
    : remark.calcId
      ? `On ${calcLabel ?? "a calc"}`
      : remark.anchor
        ? `On “${remark.anchor.quote.length > 60 ? `${remark.anchor.quote.slice(0, 57)}…` : remark.anchor.quote}”`
        : "On the whole package";

  return (
    <li className={`rounded-sm border bg-paper-raised p-2.5 text-sm ${highlighted ? "border-verdigris" : "border-rule"}`} data-testid="remark" data-remark-id={remark.id} data-remark-state={remark.state} data-detached={remark.detached ? "true" : "false"}>
      <div className="flex items-start gap-2">
        <button type="button" className="min-w-0 flex-1 text-left text-xs text-ink-soft hover:text-ink" onClick={onShow} disabled={remark.detached && !remark.calcId} title="Show where this remark is">
          {target}
        </button>
        <span className="pp-tag" data-testid="remark-state">{stateWords[remark.state]}</span>
      </div>
      <p className="mt-1.5 whitespace-pre-wrap">{remark.text}</p>
      <p className="mt-0.5 text-xs text-ink-faint">{remark.openerName} · {formatWhen(remark.createdAt)}</p>
      {remark.replies.length > 0 && (
        <ol className="mt-2 space-y-1.5 border-l-2 border-rule pl-2.5">
          {remark.replies.map((r) => (
            <li key={r.id}>
              <p className="whitespace-pre-wrap">{r.text}</p>
              <p className="text-xs text-ink-faint">{r.authorName} · {formatWhen(r.createdAt)}</p>
            </li>
          ))}
        </ol>
      )}
      {remark.state !== "closed" && !issued && (
        <div className="mt-2 space-y-1.5">
          {abilities.canReply && (
            <textarea className="pp-input min-h-[3rem] text-sm" aria-label="Reply" placeholder="Reply…" value={reply} onChange={(e) => setReply(e.target.value)} />
          )}
          <div className="flex gap-1.5">
            {abilities.canReply && (
              <button type="button" className="pp-btn-quiet px-2 py-0.5 text-xs" disabled={busy || !reply.trim()} onClick={() => send(`/api/v1/packages/${packageId}/remarks/${remark.id}/replies`, { text: reply }, "Reply sent.")}>
                Reply
              </button>
            )}
            {mayClose && (
              <button type="button" className="pp-btn-quiet px-2 py-0.5 text-xs" disabled={busy} onClick={() => send(`/api/v1/packages/${packageId}/remarks/${remark.id}/close`, undefined, "Remark closed.")}>
                Close remark
              </button>
            )}
          </div>
        </div>
      )}
    </li>
  );
}
