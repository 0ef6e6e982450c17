import type { AutosaveError } from "./autosave-state";
import type { SaveOutcome } from "./save-outcome";

type FailedOutcome = Exclude<SaveOutcome, { kind: "saved" } | { kind: "conflict" }>;

/** The same sentence whether the browser is offline or the server is down: the remedy is the same. */
export const offlineError: AutosaveError = { kind: "offline", message: "Not saved — offline, will retry" };

/** Turns a failed save into the words shown beside the document. */
export function saveErrorFor(outcome: FailedOutcome): AutosaveError {
  switch (outcome.kind) {
    case "unreachable":
      return offlineError;
    case "invalid":
      return { kind: "invalid", message: `Not saved — ${outcome.message}`, ...(outcome.path ? { path: outcome.path } : {}) };
    case "refused":
      return { kind: "refused", message: `Not saved — ${outcome.message}` };
    case "forbidden":
      return { kind: "forbidden", message: "Read-only" };
    case "signed-out":
      return { kind: "signed-out", message: "Not saved — signed out; sign in again and your text will be sent" };
    case "gone":
      return { kind: "gone", message: "Not saved — this package no longer exists; your text is kept on this device" };
  }
}
