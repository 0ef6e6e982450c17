import { z } from "zod";
import { stableJson } from "./stable-json";
import { type TipTapNode, tipTapNodeSchema } from "./tiptap-node";

/** The part of the Web Storage API the drafts need; localStorage in the browser, a Map in tests. */
export type DraftStorage = Pick<Storage, "getItem" | "setItem" | "removeItem">;

/** The author's latest document that the server has not acknowledged yet. */
export type StoredDraft = {
  /** The server version the author was editing from. */
  baseVersion: number;
  document: TipTapNode;
  editedAt: string;
};

const storedDraftSchema = z.object({ baseVersion: z.number().int(), document: tipTapNodeSchema, editedAt: z.string() });

/** `panelpoint:draft:<packageId>` — the one key a package's pending draft lives under. */
export function draftKey(packageId: string): string {
  return `panelpoint:draft:${packageId}`;
}

/**
 * The durable copy of unsaved work, so a reload, a crash or a closed tab loses
 * nothing. Storage can refuse (quota, private mode): writes report it instead
 * of throwing, so the editor can warn while it still has the text on screen.
 */
export class DraftStore {
  private readonly key: string;

  constructor(
    private readonly storage: DraftStorage | null,
    packageId: string,
  ) {
    this.key = draftKey(packageId);
  }

  /** The pending draft, or null when there is none or it cannot be read. */
  read(): StoredDraft | null {
    const raw = this.get(this.key);
    if (raw === null) return null;
    try {
      const parsed = storedDraftSchema.safeParse(JSON.parse(raw));
      return parsed.success ? parsed.data : null;
    } catch (error) {
      // A corrupt entry is left where it is rather than deleted: it may be the only copy.
      if (error instanceof SyntaxError) return null;
      throw error;
    }
  }

  /** Stores the draft; false when the storage refused it. `json` is the document already serialized by the caller (it runs per keystroke). */
  write(baseVersion: number, json: string, editedAt: Date): boolean {
    return this.set(this.key, `{"baseVersion":${baseVersion},"editedAt":${JSON.stringify(editedAt.toISOString())},"document":${json}}`);
  }

  /** Removes the draft only if it still holds exactly this content; newer typing stays. */
  clearIfContent(json: string): void {
    const draft = this.read();
    if (draft && stableJson(draft.document) === json) this.remove(this.key);
  }

  /** Removes the draft whatever it holds (the author chose another version and theirs was set aside). */
  clear(): void {
    this.remove(this.key);
  }

  /** Sets a replaced document aside under `…:rejected:<timestamp>`; returns the key, or null if storage refused. */
  keepRejected(document: TipTapNode, at: Date): string | null {
    const key = `${this.key}:rejected:${at.getTime()}`;
    return this.set(key, stableJson(document)) ? key : null;
  }

  private get(key: string): string | null {
    if (!this.storage) return null;
    try {
      return this.storage.getItem(key);
    } catch (error) {
      reportStorageError("read", error);
      return null;
    }
  }

  private set(key: string, value: string): boolean {
    if (!this.storage) return false;
    try {
      this.storage.setItem(key, value);
      return true;
    } catch (error) {
      reportStorageError("write", error);
      return false;
    }
  }

  private remove(key: string): void {
    if (!this.storage) return;
    try {
      this.storage.removeItem(key);
    } catch (error) {
      reportStorageError("remove", error);
    }
  }
}

function reportStorageError(operation: string, error: unknown): void {
  // The author sees "not kept on this device" through the write result; this is for whoever debugs it.
  console.warn(`Autosave could not ${operation} the local draft:`, error);
}
