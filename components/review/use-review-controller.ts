"use client";

import type { Editor } from "@tiptap/core";
import { NodeSelection } from "@tiptap/pm/state";
import { useCallback, useEffect, useMemo, useState } from "react";
import { currentHighlightPositions, remarkHighlightsKey, textRunsOf, type HighlightRange } from "@/components/editor/remark-highlights";
import { fetchJson } from "@/lib/client/fetch-json";
import { calcKinds } from "@/lib/calcs/calc-types";
import { findQuote } from "@/lib/review/find-quote";
import type { ReviewContextValue } from "./review-context";
import type { RemarkTarget, ReviewAbilities } from "./review-types";
import { useReviewData } from "./use-review-data";

export type ReviewControllerOptions = { editor: Editor | null; packageId: string; status: string; abilities: ReviewAbilities; lastSavedAt: unknown };

/** What the current selection would put a remark on: the selected calc, the selected words (within one paragraph), or the package. */
export function selectionTarget(editor: Editor): RemarkTarget {
  const { selection, doc } = editor.state;
  if (selection instanceof NodeSelection && (calcKinds as readonly string[]).includes(selection.node.type.name)) {
    return { kind: "calc", calcId: String(selection.node.attrs.id), label: String(selection.node.attrs.label) };
  }
  if (!selection.empty && selection.$from.parent.isTextblock) {
    const to = Math.min(selection.to, selection.$from.end());
    const quote = doc.textBetween(selection.from, to, undefined, "\ufffc");
    if (quote.trim()) return { kind: "text", from: selection.from, to, quote };
  }
  return { kind: "package" };
}

/**
 * Ties the review to the editor: highlights follow their words, a remark can
 * be shown in place, new remarks take the selection, and everything refreshes
 * after each save (a save may clear check marks).
 */
export function useReviewController({ editor, packageId, status, abilities, lastSavedAt }: ReviewControllerOptions) {
  const data = useReviewData(packageId);
  const { refresh, remarks, progress } = data;
  const [pending, setPending] = useState<RemarkTarget | null>(null);
  const [highlighted, setHighlighted] = useState<string | null>(null);

  useEffect(() => {
    if (lastSavedAt) refresh();
  }, [lastSavedAt, refresh]);

  // Re-find every text remark's words, nearest to where its highlight last was.
  useEffect(() => {
    if (!editor || editor.isDestroyed) return;
    const runs = textRunsOf(editor.state.doc);
    const positions = currentHighlightPositions(remarkHighlightsKey.getState(editor.state));
    const ranges: HighlightRange[] = [];
    for (const r of remarks) {
      if (!r.anchor || r.state === "closed") continue;
      const at = findQuote(runs, r.anchor.quote, positions.get(r.id) ?? r.anchor.from);
      if (at) ranges.push({ id: r.id, state: r.state, ...at });
    }
    editor.view.dispatch(editor.state.tr.setMeta(remarkHighlightsKey, ranges).setMeta("addToHistory", false));
  }, [editor, remarks]);

  const showRemark = useCallback(
    (remarkId: string) => {
      setHighlighted(remarkId);
      const remark = remarks.find((r) => r.id === remarkId);
      if (!remark || !editor) return;
      if (remark.calcId) {
        document.querySelector(`[data-calc-id="${CSS.escape(remark.calcId)}"]`)?.scrollIntoView({ behavior: "smooth", block: "center" });
        return;
      }
      const at = currentHighlightPositions(remarkHighlightsKey.getState(editor.state)).get(remarkId);
      if (at === undefined) return;
      const found = remark.anchor ? findQuote(textRunsOf(editor.state.doc), remark.anchor.quote, at) : null;
      if (found) editor.commands.setTextSelection(found);
      const dom = editor.view.domAtPos(at).node;
      (dom instanceof HTMLElement ? dom : dom.parentElement)?.scrollIntoView({ behavior: "smooth", block: "center" });
    },
    [editor, remarks],
  );

  const markCalc = useCallback(
    async (calcId: string, state: "checked" | "returned") => {
      await fetchJson(`/api/v1/packages/${packageId}/calcs/${encodeURIComponent(calcId)}/check`, { method: "POST", body: { state } });
      refresh();
    },
    [packageId, refresh],
  );

  const context = useMemo<ReviewContextValue>(() => {
    const checks = new Map((progress?.calcs ?? []).map((c) => [c.calcId, c]));
    return {
      abilities,
      status,
      checkOf: (calcId) => checks.get(calcId),
      remarksOn: (calcId) => remarks.filter((r) => r.calcId === calcId),
      markCalc,
      startRemark: setPending,
      showRemark,
    };
  }, [abilities, status, progress, remarks, markCalc, showRemark]);

  return { context, data, pending, setPending, highlighted, showRemark };
}
