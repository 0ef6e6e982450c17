import { stableJson } from "./stable-json";
import type { TipTapNode } from "./tiptap-node";

/**
 * One version of the author's document with its two serializations. `json` is
 * plain `JSON.stringify`, cheap enough for every keystroke: it is what goes to
 * the device and what successive edits from the same editor are compared by.
 * `stable` (sorted keys) is several times dearer, so it is computed only when
 * the document is compared with the server's copy, once per save.
 */
export class DocumentContent {
  readonly json: string;
  private stableText: string | null = null;

  constructor(readonly document: TipTapNode) {
    this.json = JSON.stringify(document);
  }

  get stable(): string {
    this.stableText ??= stableJson(this.document);
    return this.stableText;
  }
}
