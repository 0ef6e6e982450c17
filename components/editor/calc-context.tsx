"use client";

import { createContext, useContext, useRef, useSyncExternalStore, type ReactNode } from "react";
import type { CalcResult, PackageEvaluation } from "@/lib/calcs/calc-types";

/**
 * The live results, as a small external store rather than a context value:
 * a keystroke recomputes a few calcs, and only the node views whose own result
 * (or the trusses they read) changed should re-render — not all of them.
 */
export class CalcStore {
  private evaluation: PackageEvaluation;
  private listeners = new Set<() => void>();

  constructor(initial: PackageEvaluation) {
    this.evaluation = initial;
  }

  get = (): PackageEvaluation => this.evaluation;

  set(next: PackageEvaluation): void {
    if (next === this.evaluation) return;
    this.evaluation = next;
    for (const l of this.listeners) l();
  }

  subscribe = (listener: () => void): (() => void) => {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  };
}

type CalcContextValue = { store: CalcStore; editable: boolean; unitSystem: "SI" | "US" };

const CalcContext = createContext<CalcContextValue | null>(null);

export function CalcProvider({ value, children }: { value: CalcContextValue; children: ReactNode }) {
  return <CalcContext.Provider value={value}>{children}</CalcContext.Provider>;
}

function useStoreContext(): CalcContextValue {
  const v = useContext(CalcContext);
  if (!v) throw new Error("Calc node views must sit inside a CalcProvider");
  return v;
}

/** One calc's result; re-renders only when that result changes. */
export function useCalcResult(id: string | null): CalcResult | undefined {
  const { store } = useStoreContext();
  return useSyncExternalStore(store.subscribe, () => (id ? store.get().results[id] : undefined), () => (id ? store.get().results[id] : undefined));
}

/**
 * What a calc view needs of the rest of the package: the results of the Truss
 * and Combinations calcs it may read, as the same object while none of them
 * changed (an edit to an unrelated formula does not re-render a truss picker).
 */
export function useCalcContext(): { evaluation: { results: Record<string, CalcResult> }; editable: boolean; unitSystem: "SI" | "US" } {
  const { store, editable, unitSystem } = useStoreContext();
  const last = useRef<{ results: Record<string, CalcResult> }>({ results: {} });
  const select = () => {
    const results = store.get().results;
    const picked: Record<string, CalcResult> = {};
    for (const [id, r] of Object.entries(results)) if (r.kind === "truss" || r.kind === "combinations") picked[id] = r;
    const prev = last.current.results;
    const prevIds = Object.keys(prev);
    const same = prevIds.length === Object.keys(picked).length && prevIds.every((id) => prev[id] === picked[id]);
    if (!same) last.current = { results: picked };
    return last.current;
  };
  const evaluation = useSyncExternalStore(store.subscribe, select, select);
  return { evaluation, editable, unitSystem };
}
