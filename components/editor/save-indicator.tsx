"use client";

import type { AutosaveError, AutosaveStatus, OverwriteRecord } from "@/lib/client/autosave/autosave-state";
import { formatSaveTime } from "@/lib/client/autosave/format-save-time";

export type SaveIndicatorProps = {
  status: AutosaveStatus;
  lastSavedAt: string | null;
  error: AutosaveError | null;
  /** False when the browser would not keep a copy of unsaved work; said aloud while work is unsaved. */
  keptOnDevice?: boolean;
  /** A "keep mine" save; named while it is the latest save, so the author sees that it replaced someone's version. */
  lastOverwrite?: OverwriteRecord | null;
};

const tone: Record<AutosaveStatus, string> = {
  saved: "text-ink-faint",
  pending: "text-ink-soft",
  saving: "text-ink-soft",
  "not-saved": "text-caution",
  conflict: "text-compression",
  "read-only": "text-ink-soft",
};

/** A shape per state, so the state reads without colour: tick, turning arc, warning triangle, diamond, lock. */
function Shape({ status }: { status: AutosaveStatus }) {
  const common = { width: 12, height: 12, viewBox: "0 0 12 12", "aria-hidden": true, className: "shrink-0", fill: "none", stroke: "currentColor", strokeWidth: 1.5 } as const;
  switch (status) {
    case "saved":
      return <svg {...common}><path d="M2 6.5 4.8 9 10 3" strokeLinecap="round" strokeLinejoin="round" /></svg>;
    case "pending":
    case "saving":
      return <svg {...common} className="shrink-0 motion-safe:animate-spin"><path d="M6 1.5A4.5 4.5 0 1 1 1.5 6" strokeLinecap="round" /></svg>;
    case "not-saved":
      return <svg {...common}><path d="M6 1.5 11 10.5H1Z" strokeLinejoin="round" /><path d="M6 5v2.5M6 9v.01" strokeLinecap="round" /></svg>;
    case "conflict":
      return <svg {...common}><path d="M6 1 11 6 6 11 1 6Z" strokeLinejoin="round" /><path d="M6 4v2.5M6 8v.01" strokeLinecap="round" /></svg>;
    case "read-only":
      return <svg {...common}><rect x="2" y="5.5" width="8" height="5.5" rx="1" /><path d="M4 5.5V4a2 2 0 0 1 4 0v1.5" /></svg>;
  }
}

function words(status: AutosaveStatus, error: AutosaveError | null): string {
  switch (status) {
    case "saved":
      return "Saved";
    // The pause before a save is too short to name separately; both read as work under way.
    case "pending":
    case "saving":
      return "Saving…";
    case "not-saved":
      return error?.message ?? "Not saved";
    case "conflict":
      return "Not saved — someone else saved a newer version";
    case "read-only":
      return error?.message ?? "Read-only";
  }
}

/** Saved / saving / not saved beside the document, in words and a shape, announced politely to screen readers. */
export function SaveIndicator({ status, lastSavedAt, error, keptOnDevice = true, lastOverwrite = null }: SaveIndicatorProps) {
  const time = status === "saved" && lastSavedAt ? formatSaveTime(lastSavedAt) : null;
  const overwrote = status === "saved" && lastOverwrite !== null && lastOverwrite.savedAt === lastSavedAt;
  const unsaved = status === "pending" || status === "saving" || status === "not-saved" || status === "conflict";
  return (
    <div role="status" aria-live="polite" data-testid="save-indicator" data-status={status} className={`inline-flex items-center gap-1.5 text-xs ${tone[status]}`}>
      <Shape status={status} />
      <span>
        {words(status, error)}
        {time && lastSavedAt && (
          <>
            {" "}at <time dateTime={lastSavedAt}>{time}</time>
          </>
        )}
        {overwrote && ` · replaced ${lastOverwrite.replacedSavedBy}'s version ${lastOverwrite.replacedVersion}`}
        {unsaved && !keptOnDevice && <span className="font-medium"> · not kept on this device</span>}
      </span>
    </div>
  );
}
