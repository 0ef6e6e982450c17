import type { TipTapNode } from "./tiptap-node";

/** The stored document as the server reported it in a 409: newer than the one the save started from. */
export type ServerVersion = {
  version: number;
  document: TipTapNode;
  savedAt: string;
  /** Who saved it, as the server names them (shown to the author). */
  savedBy: string;
};

/**
 * What one save attempt came to, in the terms autosave acts on. Every HTTP
 * answer and every thrown fetch maps to exactly one of these.
 */
export type SaveOutcome =
  | { kind: "saved"; version: number; savedAt: string }
  | { kind: "conflict"; current: ServerVersion }
  /** 422: the document or a calc in it does not validate. */
  | { kind: "invalid"; message: string; path?: string }
  /** Any other refusal that retrying will not change (an issued package, a body too large …). */
  | { kind: "refused"; message: string }
  | { kind: "forbidden" }
  | { kind: "signed-out" }
  | { kind: "gone" }
  /** Network error, timeout, 5xx or an answer we cannot read: worth retrying. */
  | { kind: "unreachable"; detail: string };
