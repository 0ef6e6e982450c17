import type { ServerVersion } from "./save-outcome";
import type { TipTapNode } from "./tiptap-node";

/**
 * What the author is told about their work.
 * - `saved`: the server holds what is on screen.
 * - `pending`: typed moments ago; the save starts when typing pauses.
 * - `saving`: a request is on its way.
 * - `not-saved`: the server does not have the latest text; `error` says why.
 * - `conflict`: someone else saved a newer version; `conflict` holds both.
 * - `read-only`: this author may not save here.
 */
export type AutosaveStatus = "saved" | "pending" | "saving" | "not-saved" | "conflict" | "read-only";

/** Why the latest text is not on the server, worded for the author. */
export type AutosaveError = {
  kind: "offline" | "invalid" | "refused" | "forbidden" | "signed-out" | "gone";
  /** The sentence to show, e.g. "Not saved — offline, will retry". */
  message: string;
  /** For `invalid`: where in the document the server found the problem. */
  path?: string;
};

/** A stale save: the server's newer version and the author's text, side by side. Nothing is discarded. */
export type AutosaveConflict = {
  theirs: ServerVersion;
  mine: TipTapNode;
  /** The version the author's text was edited from. */
  baseVersion: number;
};

/** The author's text set aside by "reload theirs", offered for copying. */
export type RejectedDraft = {
  /** The storage key it is kept under, or null if storage refused (then it lives only here). */
  key: string | null;
  document: TipTapNode;
  /** The text without structure, for the clipboard. */
  text: string;
  rejectedAt: string;
};

/** A "keep mine" save that replaced someone else's version, kept so the UI can say so. */
export type OverwriteRecord = { replacedVersion: number; replacedSavedBy: string; version: number; savedAt: string };

export type AutosaveState = {
  status: AutosaveStatus;
  /** The server's time of the last save this session knows of. */
  lastSavedAt: string | null;
  version: number;
  error: AutosaveError | null;
  conflict: AutosaveConflict | null;
  rejected: RejectedDraft | null;
  lastOverwrite: OverwriteRecord | null;
  /** False when the browser refused to keep the latest text (quota, private mode). */
  keptOnDevice: boolean;
};
