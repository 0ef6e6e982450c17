"use client";

import { useState } from "react";
import { toast } from "sonner";
import { fetchJson } from "@/lib/client/fetch-json";
import type { RemarkTarget } from "./review-types";

function describeTarget(target: RemarkTarget): string {
  if (target.kind === "calc") return `On calc ${target.label}`;
  if (target.kind === "text") return `On “${target.quote.length > 80 ? `${target.quote.slice(0, 77)}…` : target.quote}”`;
  return "On the whole package";
}

export type NewRemarkFormProps = {
  packageId: string;
  target: RemarkTarget;
  onPickSelection: () => void;
  onCancel: () => void;
  onCreated: () => void;
};

/** Raising a remark: on the calc or words selected in the document, or on the package as a whole. */
export function NewRemarkForm({ packageId, target, onPickSelection, onCancel, onCreated }: NewRemarkFormProps) {
  const [text, setText] = useState("");
  const [busy, setBusy] = useState(false);

  async function submit() {
    setBusy(true);
    try {
      const body =
        target.kind === "calc" ? { text, calcId: target.calcId } : target.kind === "text" ? { text, anchor: { from: target.from, to: target.to, quote: target.quote } } : { text };
      await fetchJson(`/api/v1/packages/${packageId}/remarks`, { method: "POST", body });
      toast.success("Remark raised.");
      setText("");
      onCreated();
    } catch (e) {
      toast.error(e instanceof Error ? e.message : "Could not raise the remark.");
    } finally {
      setBusy(false);
    }
  }

  return (
    <form
      className="space-y-2 rounded-sm border border-verdigris bg-paper-raised p-2.5 text-sm"
      aria-label="New remark"
      onSubmit={(e) => {
        e.preventDefault();
        void submit();
      }}
    >
      <div className="flex items-center gap-2 text-xs text-ink-soft">
        <span className="min-w-0 flex-1" data-testid="remark-target">{describeTarget(target)}</span>
        <button type="button" className="underline underline-offset-2" onClick={onPickSelection}>Use selection</button>
      </div>
      <textarea className="pp-input min-h-[4rem]" aria-label="Remark" placeholder="What should the engineer look at?" value={text} onChange={(e) => setText(e.target.value)} autoFocus />
      <div className="flex gap-1.5">
        <button type="submit" className="pp-btn px-2 py-0.5 text-xs" disabled={busy || !text.trim()}>Raise remark</button>
        <button type="button" className="pp-btn-quiet px-2 py-0.5 text-xs" onClick={onCancel}>Cancel</button>
      </div>
    </form>
  );
}
