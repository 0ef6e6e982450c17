"use client";

import { useCallback, useEffect, useRef, useState, useSyncExternalStore } from "react";
import { AutosaveController, type RestoredDraft } from "@/lib/client/autosave/autosave-controller";
import type { AutosaveState } from "@/lib/client/autosave/autosave-state";
import { browserStorage } from "@/lib/client/autosave/browser-storage";
import type { DraftStorage } from "@/lib/client/autosave/draft-store";
import type { FetchLike } from "@/lib/client/autosave/send-document";
import type { TipTapNode } from "@/lib/client/autosave/tiptap-node";

export type UseAutosaveOptions = {
  packageId: string;
  initialVersion: number;
  canEdit: boolean;
  /** The document the editor opened with: unchanged text then skips a save, and a merge has a true base. */
  initialDocument?: TipTapNode | null;
  fetchImpl?: FetchLike;
  /** Where unsaved work is kept; localStorage unless given (null keeps it only in memory). */
  storage?: DraftStorage | null;
  /** Called once on start with a draft a reload or a crash left behind: put it on screen without emitting an update. */
  onRestore?: (document: TipTapNode, draft: RestoredDraft) => void;
};

export type UseAutosaveResult = AutosaveState & {
  /** The draft found on start (already being sent), or null. */
  restored: RestoredDraft | null;
  edit: (document: TipTapNode) => void;
  flush: () => Promise<void>;
  /** Takes the server's document; returns it for the editor. The author's text is set aside in `rejected`. */
  reloadTheirs: () => TipTapNode | null;
  keepMine: () => void;
  /** Merges both documents; returns the merged one for the editor. */
  merge: () => TipTapNode | null;
  dismissRejected: () => void;
};

const noSubscription = () => () => undefined;

/** Autosave for the package editor: the controller wired to the window's online/offline, unload and hide events. */
export function useAutosave(options: UseAutosaveOptions): UseAutosaveResult {
  const { packageId, canEdit } = options;
  // Read when the controller is created: a new fetch or storage object on every render must not restart autosave.
  const latestOptions = useRef(options);
  useEffect(() => {
    latestOptions.current = options;
  });
  const controllerRef = useRef<AutosaveController | null>(null);
  const earlyEdit = useRef<TipTapNode | null>(null);
  const [controller, setController] = useState<AutosaveController | null>(null);
  const [restored, setRestored] = useState<RestoredDraft | null>(null);
  const [placeholder] = useState<AutosaveState>(() => ({
    status: canEdit ? "saved" : "read-only",
    lastSavedAt: null,
    version: options.initialVersion,
    error: null,
    conflict: null,
    rejected: null,
    lastOverwrite: null,
    keptOnDevice: true,
  }));

  useEffect(() => {
    const current = latestOptions.current;
    const created = new AutosaveController({
      packageId,
      canEdit,
      initialVersion: current.initialVersion,
      initialDocument: current.initialDocument,
      fetchImpl: current.fetchImpl ?? ((url, init) => fetch(url, init)),
      storage: current.storage === undefined ? browserStorage() : current.storage,
      online: navigator.onLine,
    });
    controllerRef.current = created;
    setController(created);
    const draft = created.restore();
    setRestored(draft);
    if (draft) current.onRestore?.(draft.document, draft);
    if (earlyEdit.current) created.edit(earlyEdit.current);
    earlyEdit.current = null;

    const onOnline = () => created.setOnline(true);
    const onOffline = () => created.setOnline(false);
    const onBeforeUnload = (event: BeforeUnloadEvent) => {
      if (!created.hasUnsavedWork()) return;
      void created.flush();
      // The prompt gives the flush time to land; the draft is on the device either way.
      event.preventDefault();
      event.returnValue = "";
    };
    // Mobile browsers may kill a hidden tab without an unload event: send what is waiting now.
    const onVisibility = () => {
      if (document.visibilityState === "hidden" && created.hasUnsavedWork()) void created.flush();
    };
    window.addEventListener("online", onOnline);
    window.addEventListener("offline", onOffline);
    window.addEventListener("beforeunload", onBeforeUnload);
    document.addEventListener("visibilitychange", onVisibility);
    return () => {
      window.removeEventListener("online", onOnline);
      window.removeEventListener("offline", onOffline);
      window.removeEventListener("beforeunload", onBeforeUnload);
      document.removeEventListener("visibilitychange", onVisibility);
      created.dispose();
      controllerRef.current = null;
    };
  }, [packageId, canEdit]);

  const subscribe = controller ? controller.subscribe : noSubscription;
  const getSnapshot = () => (controller ? controller.getState() : placeholder);
  const state = useSyncExternalStore(subscribe, getSnapshot, () => placeholder);

  const edit = useCallback((document: TipTapNode) => {
    if (controllerRef.current) controllerRef.current.edit(document);
    else earlyEdit.current = document;
  }, []);
  const flush = useCallback(async () => {
    await controllerRef.current?.flush();
  }, []);
  const reloadTheirs = useCallback(() => controllerRef.current?.reloadTheirs() ?? null, []);
  const keepMine = useCallback(() => controllerRef.current?.keepMine(), []);
  const merge = useCallback(() => controllerRef.current?.merge()?.document ?? null, []);
  const dismissRejected = useCallback(() => controllerRef.current?.dismissRejected(), []);

  return { ...state, restored, edit, flush, reloadTheirs, keepMine, merge, dismissRejected };
}
