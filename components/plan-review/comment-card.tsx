"use client";

import { useState } from "react";
import { toast } from "sonner";
import { fetchJson } from "@/lib/client/fetch-json";
import { AnsweredInPicker } from "./answered-in-picker";
import type { AnsweredInDto, CommentDto, DraftPlaces } from "./plan-review-types";

export type CommentCardProps = { packageId: string; comment: CommentDto; places: DraftPlaces; canManage: boolean; onChanged: () => void };

/** One comment quoted as the office wrote it, with the response and where the draft answers it, saved on its own. */
export function CommentCard({ packageId, comment, places, canManage, onChanged }: CommentCardProps) {
  const [response, setResponse] = useState(comment.response);
  const [answeredIn, setAnsweredIn] = useState<AnsweredInDto[]>(comment.answeredIn);
  const [busy, setBusy] = useState(false);
  const editable = canManage && comment.editable;
  const dirty = response !== comment.response || JSON.stringify(answeredIn) !== JSON.stringify(comment.answeredIn);
  const url = `/api/v1/packages/${packageId}/plan-review/${comment.id}`;

  async function save() {
    setBusy(true);
    try {
      await fetchJson(url, { method: "PATCH", body: { response, answeredIn: answeredIn.map((l) => (l.type === "calc" ? { type: "calc", calcId: l.calcId } : { type: "heading", index: l.index, text: l.text })) } });
      toast.success(`Response to comment ${comment.number} saved.`);
      onChanged();
    } catch (e) {
      toast.error(e instanceof Error ? e.message : "Could not save the response.", { duration: 8000 });
    } finally {
      setBusy(false);
    }
  }

  async function remove() {
    if (!window.confirm(`Remove comment ${comment.number}? The audit trail keeps a record of it.`)) return;
    setBusy(true);
    try {
      await fetchJson(url, { method: "DELETE" });
      toast.success(`Comment ${comment.number} removed.`);
      onChanged();
    } catch (e) {
      toast.error(e instanceof Error ? e.message : "Could not remove the comment.");
    } finally {
      setBusy(false);
    }
  }

  return (
    <li className="space-y-2 rounded-sm border border-rule bg-paper-raised p-3 text-sm" data-testid="plan-review-comment" data-number={comment.number}>
      <div className="flex items-baseline gap-2">
        <span className="pp-num text-base font-semibold">{comment.number}</span>
        <span className="text-xs text-ink-faint">
          Rev {comment.revisionLabel}
          {comment.reviewer ? ` · ${comment.reviewer}` : ""}
          {comment.receivedOn ? ` · received ${comment.receivedOn}` : ""}
        </span>
        {!comment.response.trim() && comment.editable && <span className="pp-tag ml-auto">No response yet</span>}
      </div>
      <blockquote className="whitespace-pre-wrap border-l-2 border-rule pl-2.5 text-ink-soft">{comment.text}</blockquote>
      {editable ? (
        <label className="block space-y-0.5">
          <span className="pp-label block">Response</span>
          <textarea className="pp-input min-h-20 w-full text-sm" value={response} onChange={(e) => setResponse(e.target.value)} placeholder="How the revised package answers this comment." />
        </label>
      ) : (
        <p className="whitespace-pre-wrap"><span className="pp-label mr-1">Response</span>{comment.response || <span className="text-ink-faint">none</span>}</p>
      )}
      <AnsweredInPicker places={places} value={answeredIn} disabled={!editable} onChange={setAnsweredIn} />
      {editable && (
        <div className="flex gap-2">
          <button type="button" className="pp-btn px-2 py-1 text-xs" disabled={busy || !dirty} onClick={save}>Save response</button>
          <button type="button" className="pp-btn-quiet px-2 py-1 text-xs" disabled={busy || !dirty} onClick={() => { setResponse(comment.response); setAnsweredIn(comment.answeredIn); }}>Undo changes</button>
          <button type="button" className="pp-btn-danger ml-auto px-2 py-1 text-xs" disabled={busy} onClick={remove}>Remove</button>
        </div>
      )}
    </li>
  );
}
