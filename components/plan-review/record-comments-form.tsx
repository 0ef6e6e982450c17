"use client";

import { useMemo, useState } from "react";
import { toast } from "sonner";
import { fetchJson } from "@/lib/client/fetch-json";
import { splitNumberedList } from "@/lib/plan-review/split-numbered-list";
import { PastePreview } from "./paste-preview";
import type { RevisionChoice } from "./plan-review-types";

export type RecordCommentsFormProps = { packageId: string; answers: RevisionChoice; revisions: RevisionChoice[]; onSaved: () => void };

/** The permit office's letter pasted as a numbered list: split in the browser for a preview, split again by the server on save. */
export function RecordCommentsForm({ packageId, answers, revisions, onSaved }: RecordCommentsFormProps) {
  const [reviewer, setReviewer] = useState("");
  const [receivedOn, setReceivedOn] = useState("");
  const [paste, setPaste] = useState("");
  const [busy, setBusy] = useState(false);
  const split = useMemo(() => splitNumberedList(paste), [paste]);

  async function save() {
    setBusy(true);
    try {
      const res = await fetchJson<{ comments: unknown[] }>(`/api/v1/packages/${packageId}/plan-review`, {
        method: "POST",
        body: { revisionId: answers.id, reviewer: reviewer.trim() || null, receivedOn: receivedOn || null, paste },
      });
      toast.success(`${res.comments.length} comment${res.comments.length === 1 ? "" : "s"} recorded on Rev ${answers.label}.`);
      setPaste("");
      onSaved();
    } catch (e) {
      toast.error(e instanceof Error ? e.message : "Could not record the comments.", { duration: 8000 });
    } finally {
      setBusy(false);
    }
  }

  return (
    <section className="space-y-3 rounded-sm border border-rule bg-paper-raised p-3" aria-label="Record comments">
      <h3 className="font-serif text-lg font-semibold">Record the permit office’s comments</h3>
      <div className="flex flex-wrap gap-3 text-sm">
        <label className="space-y-0.5">
          <span className="pp-label block">Reviewed revision</span>
          {/* The draft answers the latest issued revision only; earlier ones were answered by the revisions after them. */}
          <select className="pp-input" value={answers.id} onChange={() => undefined} aria-label="Reviewed revision">
            {revisions.map((r) => (
              <option key={r.id} value={r.id} disabled={r.id !== answers.id}>
                Rev {r.label}{r.id === answers.id ? " (answered by this draft)" : " (answered by a later revision)"}
              </option>
            ))}
          </select>
        </label>
        <label className="space-y-0.5">
          <span className="pp-label block">Reviewer</span>
          <input className="pp-input" value={reviewer} onChange={(e) => setReviewer(e.target.value)} placeholder="Plans examiner" maxLength={200} />
        </label>
        <label className="space-y-0.5">
          <span className="pp-label block">Received on</span>
          <input className="pp-input" type="date" value={receivedOn} onChange={(e) => setReceivedOn(e.target.value)} />
        </label>
      </div>
      <label className="block space-y-0.5">
        <span className="pp-label block">Paste the comments as a numbered list</span>
        <textarea
          className="pp-input min-h-40 w-full font-mono text-sm"
          value={paste}
          onChange={(e) => setPaste(e.target.value)}
          placeholder={"1. Provide the wind load derivation.\n2) Verify joint L2 under the revised load.\nComment 3: Show the bearing detail."}
          data-testid="paste-box"
        />
      </label>
      <PastePreview split={split} />
      <button type="button" className="pp-btn" disabled={busy || split.items.length === 0} onClick={save}>
        Save {split.items.length > 0 ? `${split.items.length} comment${split.items.length === 1 ? "" : "s"}` : "comments"}
      </button>
    </section>
  );
}
