import { stableJson } from "./stable-json";
import type { TipTapNode } from "./tiptap-node";

/**
 * The stored version the author's text builds on, and what the server holds
 * there when that is known. Unknown after a restore from an older version:
 * then nothing counts as "already saved" and a merge has no true base.
 */
export class ServerBase {
  version: number;
  document: TipTapNode | null = null;
  private json: string | null = null;

  constructor(version: number, document: TipTapNode | null) {
    this.version = version;
    this.set(version, document);
  }

  /** The server stored `document` (or something unknown, for null) as `version`. */
  set(version: number, document: TipTapNode | null, json?: string): void {
    this.version = version;
    this.document = document;
    this.json = document ? (json ?? stableJson(document)) : null;
  }

  holds(json: string): boolean {
    return json === this.json;
  }
}
