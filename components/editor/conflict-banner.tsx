"use client";

import { useId } from "react";
import { toast } from "sonner";
import type { AutosaveConflict, RejectedDraft } from "@/lib/client/autosave/autosave-state";
import { formatSaveTime } from "@/lib/client/autosave/format-save-time";

export type ConflictBannerProps = {
  conflict: AutosaveConflict | null;
  onReload: () => void;
  onKeepMine: () => void;
  onMerge: () => void;
  /** Text set aside by "reload theirs", offered for copying until dismissed. */
  rejected?: RejectedDraft | null;
  onDismissRejected?: () => void;
};

function copyText(text: string) {
  navigator.clipboard.writeText(text).then(
    () => toast.success("Your text is on the clipboard."),
    (error: unknown) => toast.error(`Could not copy (${error instanceof Error ? error.message : "clipboard refused"}); select it under “Show my text”.`),
  );
}

function RejectedOffer({ rejected, onDismiss }: { rejected: RejectedDraft; onDismiss?: () => void }) {
  return (
    <section role="status" className="pp-panel space-y-2 border-l-2 border-l-caution px-4 py-3 text-sm" data-testid="rejected-draft">
      <p>
        {rejected.key
          ? "Their version is on screen. Your text is set aside on this device; copy it to bring parts back."
          : "Their version is on screen. This browser would not store your text, so copy it now — it is kept only until you leave the page."}
      </p>
      <div className="flex flex-wrap gap-2">
        <button type="button" className="pp-btn-quiet" onClick={() => copyText(rejected.text)}>Copy my text</button>
        {onDismiss && <button type="button" className="pp-btn-quiet" onClick={onDismiss}>Dismiss</button>}
      </div>
      <details>
        <summary className="cursor-pointer text-xs text-ink-soft">Show my text</summary>
        <textarea readOnly className="pp-input mt-2 h-40 font-serif" value={rejected.text} aria-label="Your set-aside text" />
      </details>
    </section>
  );
}

/**
 * Shown when a save was refused because someone else saved first. Says who and
 * when, that the author's text is still on screen, and offers the three ways on.
 */
export function ConflictBanner({ conflict, onReload, onKeepMine, onMerge, rejected, onDismissRejected }: ConflictBannerProps) {
  const id = useId();
  if (!conflict) return rejected ? <RejectedOffer rejected={rejected} onDismiss={onDismissRejected} /> : null;
  const { theirs } = conflict;
  const when = formatSaveTime(theirs.savedAt);
  const choices = [
    { key: "reload", label: "Reload their version", onClick: onReload, help: "Shows their text; yours is set aside on this device for you to copy from." },
    { key: "keep", label: "Keep mine", onClick: onKeepMine, help: "Saves your text over theirs. Their changes are replaced, and the overwrite is recorded." },
    {
      key: "merge",
      label: "Merge both",
      onClick: onMerge,
      help: "Combines the two paragraph by paragraph. Where you both changed the same place, both versions are kept under a “Conflict” note for you to settle.",
    },
  ];
  return (
    <section role="alert" aria-labelledby={`${id}-title`} className="pp-panel space-y-3 border-l-2 border-l-compression px-4 py-3 text-sm" data-testid="conflict-banner">
      <h3 id={`${id}-title`} className="font-medium text-compression">Someone else saved a newer version</h3>
      <p>
        {theirs.savedBy} saved version {theirs.version}
        {when ? ` at ${when}` : ""} while you were editing version {conflict.baseVersion}. Your text is still on screen and kept on
        this device; nothing has been thrown away. Your latest changes are not saved until you choose:
      </p>
      <ul className="space-y-2">
        {choices.map((choice) => (
          <li key={choice.key} className="flex flex-wrap items-baseline gap-x-3 gap-y-1">
            <button type="button" className={choice.key === "merge" ? "pp-btn" : "pp-btn-quiet"} onClick={choice.onClick} aria-describedby={`${id}-${choice.key}`}>
              {choice.label}
            </button>
            <span id={`${id}-${choice.key}`} className="text-xs text-ink-soft">{choice.help}</span>
          </li>
        ))}
      </ul>
    </section>
  );
}
