import type { AutosaveState } from "./autosave-state";
import { AutosaveStateCell } from "./autosave-state-cell";
import { type AutosaveTimers, globalTimers } from "./autosave-timers";
import { documentPlainText } from "./document-plain-text";
import { type DraftStorage, DraftStore, type StoredDraft } from "./draft-store";
import { mergeText, type MergeTextResult } from "./merge-text";
import { SaveLoop } from "./save-loop";
import type { FetchLike } from "./send-document";
import { stableJson } from "./stable-json";
import type { TipTapNode } from "./tiptap-node";

export type AutosaveControllerOptions = {
  packageId: string;
  /** The stored version the editor opened. */
  initialVersion: number;
  /** The stored document the editor opened, if at hand: unchanged text then skips a save and merges get a true base. */
  initialDocument?: TipTapNode | null;
  canEdit: boolean;
  fetchImpl: FetchLike;
  /** Where unsaved work is kept; null keeps nothing (the state then says `keptOnDevice: false`). */
  storage: DraftStorage | null;
  /** Quiet time after the last edit before saving; 800 ms unless given. */
  debounceMs?: number;
  /** Whether the browser is online at start; true unless given. */
  online?: boolean;
  timers?: AutosaveTimers;
  now?: () => Date;
};

/** A draft found on start. `serverMovedOn`: it was edited from an older version, so it will come back as a conflict. */
export type RestoredDraft = StoredDraft & { serverMovedOn: boolean };

/**
 * Autosave for one package, free of React and the DOM: the save loop plus the
 * start-up restore and the three ways out of a conflict. Nothing the author
 * typed is dropped: the latest document is on the device until the server
 * acknowledges exactly that content, and a version they turn down is set aside.
 */
export class AutosaveController {
  private readonly cell: AutosaveStateCell;
  private readonly drafts: DraftStore;
  private readonly loop: SaveLoop;
  private readonly now: () => Date;
  private restored: RestoredDraft | null | undefined;

  constructor(private readonly options: AutosaveControllerOptions) {
    this.now = options.now ?? (() => new Date());
    this.drafts = new DraftStore(options.storage, options.packageId);
    this.cell = new AutosaveStateCell({
      status: options.canEdit ? "saved" : "read-only",
      lastSavedAt: null,
      version: options.initialVersion,
      error: null,
      conflict: null,
      rejected: null,
      lastOverwrite: null,
      keptOnDevice: options.storage !== null,
    });
    this.loop = new SaveLoop({
      packageId: options.packageId,
      fetchImpl: options.fetchImpl,
      drafts: this.drafts,
      cell: this.cell,
      timers: options.timers ?? globalTimers,
      now: this.now,
      debounceMs: options.debounceMs ?? 800,
      online: options.online ?? true,
      canEdit: options.canEdit,
      version: options.initialVersion,
      baseDocument: options.initialDocument ?? null,
    });
  }

  getState = (): AutosaveState => this.cell.get();
  subscribe = (listener: () => void): (() => void) => this.cell.subscribe(listener);

  /** The editor's document changed: kept on the device at once, sent when typing pauses. */
  edit(document: TipTapNode): void {
    this.loop.edit(document);
  }

  /** Sends the latest text now; resolves once nothing is in flight. */
  async flush(): Promise<AutosaveState> {
    await this.loop.flush();
    return this.cell.get();
  }

  setOnline(online: boolean): void {
    this.loop.setOnline(online);
  }

  /** Work the server does not have yet (it is on the device, but closing the page should still warn). */
  hasUnsavedWork(): boolean {
    return this.loop.hasUnsavedWork() || this.cell.get().conflict !== null;
  }

  /**
   * Call once on start, before the first edit. Returns the draft a reload or a
   * crash left behind — the editor must put its document on screen — and starts
   * sending it from its own base version: if the server is still there it is
   * simply saved; if the server moved on, the answer is a conflict.
   */
  restore(): RestoredDraft | null {
    if (this.restored !== undefined) return this.restored;
    const draft = this.drafts.read();
    if (!draft || this.loop.base.holds(stableJson(draft.document))) {
      if (draft) this.drafts.clear();
      this.restored = null;
      return null;
    }
    this.restored = { ...draft, serverMovedOn: draft.baseVersion !== this.options.initialVersion };
    if (this.options.canEdit) this.loop.startFrom(draft.document, draft.baseVersion);
    return this.restored;
  }

  /** Conflict: take the server's document (returned, for the editor). The author's is kept under `…:rejected:<timestamp>`. */
  reloadTheirs(): TipTapNode | null {
    const conflict = this.cell.get().conflict;
    if (!conflict) return null;
    const at = this.now();
    const key = this.drafts.keepRejected(conflict.mine, at);
    this.loop.rebaseOnto(conflict.theirs);
    this.drafts.clear();
    this.cell.set({
      status: "saved",
      conflict: null,
      version: conflict.theirs.version,
      lastSavedAt: conflict.theirs.savedAt,
      rejected: { key, document: conflict.mine, text: documentPlainText(conflict.mine), rejectedAt: at.toISOString() },
      keptOnDevice: key !== null,
    });
    return conflict.theirs.document;
  }

  /** Conflict: save the author's document over the server's newer one — an explicit overwrite, recorded in `lastOverwrite`. */
  keepMine(): void {
    const conflict = this.cell.get().conflict;
    if (!conflict) return;
    this.loop.rebaseOnto(conflict.theirs);
    this.loop.resume(conflict.mine, conflict.theirs);
  }

  /** Conflict: combine both documents block by block (see `mergeText`), save the result on top of theirs and return it for the editor. */
  merge(): MergeTextResult | null {
    const conflict = this.cell.get().conflict;
    if (!conflict) return null;
    const { theirs, mine } = conflict;
    const result = mergeText({ base: this.loop.base.document, mine, theirs: theirs.document, theirsLabel: theirs.savedBy });
    this.loop.rebaseOnto(theirs);
    this.loop.resume(result.document, null);
    return result;
  }

  /** Hides the offer to copy set-aside text; the stored copy stays. */
  dismissRejected(): void {
    this.cell.set({ rejected: null });
  }

  /** Stops timers and listeners. Text waiting for the pause is sent now; the draft stays until it is acknowledged. */
  dispose(): void {
    this.loop.stop();
    this.cell.close();
  }
}
