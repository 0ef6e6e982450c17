import type { AutosaveStateCell } from "./autosave-state-cell";
import type { AutosaveState } from "./autosave-state";
import type { AutosaveTimers } from "./autosave-timers";
import { backoffDelay } from "./backoff-delay";
import { DocumentContent } from "./document-content";
import type { DraftStore } from "./draft-store";
import { OneShotTimer } from "./one-shot-timer";
import { offlineError, saveErrorFor } from "./save-error-for";
import type { SaveOutcome, ServerVersion } from "./save-outcome";
import { type FetchLike, sendDocument } from "./send-document";
import { ServerBase } from "./server-base";
import { stableJson } from "./stable-json";
import type { TipTapNode } from "./tiptap-node";

export type SaveLoopOptions = {
  packageId: string;
  fetchImpl: FetchLike;
  drafts: DraftStore;
  cell: AutosaveStateCell;
  timers: AutosaveTimers;
  now: () => Date;
  debounceMs: number;
  online: boolean;
  canEdit: boolean;
  /** The stored version the editor opened, and its document when known. */
  version: number;
  baseDocument: TipTapNode | null;
};

type Sending = { content: DocumentContent; version: number; overwrite: ServerVersion | null };

/**
 * The sending half of autosave: debounce, one request in flight, queueing,
 * retries with backoff, and keeping the draft store in step with what the
 * server acknowledged. It stops at a conflict; resolving one is the caller's.
 */
export class SaveLoop {
  /** The version the text builds on; its document is the base of a merge. */
  readonly base: ServerBase;
  /** The newest text not yet acknowledged; null when the server has what is on screen. */
  private latest: DocumentContent | null = null;
  private sending: Promise<void> | null = null;
  private sendWhenDone = false;
  private overwrite: ServerVersion | null = null;
  private readonly debounce: OneShotTimer;
  private readonly retry: OneShotTimer;
  private attempt = 0;
  private online: boolean;
  private forbidden = false;
  private stopped = false;

  constructor(private readonly o: SaveLoopOptions) {
    this.base = new ServerBase(o.version, o.baseDocument);
    this.online = o.online;
    this.debounce = new OneShotTimer(o.timers);
    this.retry = new OneShotTimer(o.timers);
  }

  hasUnsavedWork(): boolean {
    return this.latest !== null || this.sending !== null;
  }

  /** Runs on every keystroke, so it costs one `JSON.stringify` and one storage write; comparing with the server waits for the pause. */
  edit(document: TipTapNode): void {
    if (!this.o.canEdit) return;
    const content = new DocumentContent(document);
    if (content.json === this.latest?.json) return;
    const conflict = this.o.cell.get().conflict;
    this.latest = content;
    const keptOnDevice = this.o.drafts.write(this.base.version, content.json, this.o.now());
    if (conflict) return this.publish({ conflict: { ...conflict, mine: document }, keptOnDevice });
    if (this.forbidden) return this.publish({ keptOnDevice });
    // While offline or backing off, the retry sends the latest text; typing does not hurry it.
    if (this.online && !this.retry.pending && !this.stopped) this.debounce.start(this.o.debounceMs, () => this.dispatch());
    if (!this.online && !this.sending) return this.publish({ status: "not-saved", error: offlineError, keptOnDevice });
    this.publish({ status: this.sending ? "saving" : this.o.cell.get().error ? "not-saved" : "pending", keptOnDevice });
  }

  async flush(): Promise<void> {
    this.debounce.cancel();
    this.retry.cancel();
    this.dispatch();
    while (this.sending) await this.sending;
  }

  setOnline(online: boolean): void {
    this.online = online;
    this.retry.cancel();
    if (online) {
      this.attempt = 0;
      this.dispatch();
    } else if (this.latest && !this.sending && !this.o.cell.get().conflict && !this.forbidden) {
      this.debounce.cancel();
      this.publish({ status: "not-saved", error: offlineError });
    }
  }

  /** Picks up text from an earlier session, edited from `version` (whose document is unknown when the server moved on). */
  startFrom(document: TipTapNode, version: number): void {
    if (version !== this.base.version) this.base.set(version, null);
    this.latest = new DocumentContent(document);
    this.dispatch();
  }

  /** After a conflict: the server's version becomes the one the text builds on. */
  rebaseOnto(theirs: ServerVersion): void {
    this.base.set(theirs.version, theirs.document);
    this.latest = null;
  }

  /** Saves `document` on top of the current version; `overwrite` marks a deliberate replacement of theirs. */
  resume(document: TipTapNode, overwrite: ServerVersion | null): void {
    this.latest = new DocumentContent(document);
    this.overwrite = overwrite;
    this.publish({ status: "pending", conflict: null, keptOnDevice: this.o.drafts.write(this.base.version, this.latest.json, this.o.now()) });
    this.dispatch();
  }

  /** No more timers; text waiting for the pause is sent now, and an answer still on its way still clears the draft. */
  stop(): void {
    if (this.debounce.pending) this.dispatch();
    this.debounce.cancel();
    this.retry.cancel();
    this.stopped = true;
  }

  private dispatch(): void {
    const latest = this.latest;
    if (!latest || this.o.cell.get().conflict || this.forbidden) return;
    if (this.sending) {
      this.sendWhenDone = true;
      return;
    }
    if (!this.online) return this.publish({ status: "not-saved", error: offlineError });
    this.debounce.cancel();
    this.retry.cancel();
    if (this.base.holds(latest.stable)) {
      // Typed back to what the server holds: nothing to send, nothing to keep.
      this.latest = null;
      this.o.drafts.clearIfContent(latest.stable);
      return this.publish({ status: "saved", error: null });
    }
    const sent: Sending = { content: latest, version: this.base.version, overwrite: this.overwrite };
    this.sendWhenDone = false;
    this.publish({ status: "saving" });
    const { fetchImpl, packageId } = this.o;
    const overwritesVersion = sent.overwrite?.version;
    this.sending = sendDocument({ fetchImpl, packageId, version: sent.version, document: latest.document, overwritesVersion }).then((outcome) => {
      this.sending = null;
      this.settle(sent, outcome);
    });
  }

  private settle(sent: Sending, outcome: SaveOutcome): void {
    if (outcome.kind === "saved") return this.acknowledge(sent, outcome.version, outcome.savedAt);
    if (outcome.kind === "conflict") return this.conflictWith(sent, outcome.current);
    const error = saveErrorFor(outcome);
    if (outcome.kind === "forbidden") {
      this.forbidden = true;
      this.debounce.cancel();
      return this.publish({ status: "read-only", error });
    }
    this.publish({ status: "not-saved", error });
    if (outcome.kind === "unreachable") return this.scheduleRetry();
    // Refused as it was; newer typing may have fixed it, so that goes ahead.
    if (this.sendWhenDone) this.dispatch();
  }

  private acknowledge(sent: Sending, version: number, savedAt: string): void {
    this.base.set(version, sent.content.document, sent.content.stable);
    this.attempt = 0;
    this.overwrite = null;
    const { overwrite: replaced } = sent;
    const lastOverwrite = replaced ? { replacedVersion: replaced.version, replacedSavedBy: replaced.savedBy, version, savedAt } : this.o.cell.get().lastOverwrite;
    if (this.latest === sent.content || this.latest?.json === sent.content.json) {
      this.latest = null;
      this.o.drafts.clearIfContent(sent.content.stable);
    } else if (this.latest) {
      // Newer typing is waiting: its draft now builds on the version just stored.
      this.o.drafts.write(version, this.latest.json, this.o.now());
    }
    this.publish({ status: this.latest ? "pending" : "saved", lastSavedAt: savedAt, error: null, lastOverwrite });
    if (this.latest && (this.sendWhenDone || !this.debounce.pending)) this.dispatch();
  }

  private conflictWith(sent: Sending, theirs: ServerVersion): void {
    const stored = stableJson(theirs.document);
    const mine = this.latest ?? sent.content;
    // The server already holds our text: an answer was lost, or a restored draft had been sent before.
    if (stored === sent.content.stable || stored === mine.stable) {
      const held = stored === sent.content.stable ? sent.content : mine;
      return this.acknowledge({ content: held, version: sent.version, overwrite: null }, theirs.version, theirs.savedAt);
    }
    this.debounce.cancel();
    this.sendWhenDone = false;
    this.overwrite = null;
    this.publish({ status: "conflict", error: null, conflict: { theirs, mine: mine.document, baseVersion: sent.version } });
  }

  private scheduleRetry(): void {
    this.sendWhenDone = false;
    if (!this.online || this.stopped || !this.latest) return;
    this.retry.start(backoffDelay(this.attempt++), () => this.dispatch());
  }

  private publish(patch: Partial<AutosaveState>): void {
    this.o.cell.set({ ...patch, version: this.base.version });
  }
}
