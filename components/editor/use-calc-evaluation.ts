"use client";

import type { JSONContent } from "@tiptap/core";
import { useCallback, useRef, useState } from "react";
import type { CalcNode, PackageEvaluation } from "@/lib/calcs/calc-types";
import { evaluateCalcs } from "@/lib/calcs/evaluate-calcs";
import { extractCalcs } from "@/lib/calcs/extract-calcs";

/**
 * Live results in the browser: on every document change, only the calcs whose
 * inputs changed (and what depends on them) are recomputed by lib/calcs.
 */
export function useCalcEvaluation(initial: JSONContent) {
  const previousInputs = useRef<Map<string, string>>(new Map());
  const previous = useRef<PackageEvaluation | undefined>(undefined);
  const [evaluation, setEvaluation] = useState<PackageEvaluation>(() => {
    const calcs = extractCalcs(initial);
    const first = evaluateCalcs({ calcs });
    remember(previousInputs.current, calcs);
    previous.current = first;
    return first;
  });

  const recompute = useCallback((doc: JSONContent) => {
    const started = performance.now();
    const calcs = extractCalcs(doc);
    const changed = changedCalcs(previousInputs.current, calcs);
    if (changed === null) return;
    const next = evaluateCalcs({ calcs, previous: previous.current, changed });
    remember(previousInputs.current, calcs);
    previous.current = next;
    setEvaluation(next);
    performance.measure("panelpoint:recompute", { start: started, detail: { calcs: calcs.length, recomputed: next.recomputed.length } });
  }, []);

  return { evaluation, recompute };
}

function key(c: CalcNode): string {
  return `${c.label}\u0000${JSON.stringify(c.inputs)}`;
}

function remember(map: Map<string, string>, calcs: CalcNode[]) {
  map.clear();
  for (const c of calcs) map.set(c.id, key(c));
}

/** Ids whose label or inputs changed, were added, or whose neighbours were removed; null when nothing calc-related changed. */
function changedCalcs(before: Map<string, string>, calcs: CalcNode[]): string[] | null {
  const changed: string[] = [];
  for (const c of calcs) if (before.get(c.id) !== key(c)) changed.push(c.id);
  const removed = [...before.keys()].some((id) => !calcs.some((c) => c.id === id));
  if (removed) return calcs.map((c) => c.id);
  return changed.length ? changed : null;
}
