"use client";

import { useRef } from "react";
import { useCalcContext } from "../../calc-context";
import { trussSources, type TrussSource } from "./truss-sources";

const same = (a: readonly TrussSource[], b: readonly TrussSource[]) =>
  a.length === b.length && a.every((s, i) => s.label === b[i].label && s.kind === b[i].kind && s.value === b[i].value);

/**
 * The package's trusses for a reading calc, as the same array while none of
 * them changed: every keystroke anywhere makes a new evaluation, and a calc
 * body memoised on its props can then skip re-rendering its diagram and tables.
 */
export function useTrussSources(): TrussSource[] {
  const { evaluation } = useCalcContext();
  const last = useRef<TrussSource[]>([]);
  const next = trussSources(evaluation);
  if (!same(last.current, next)) last.current = next;
  return last.current;
}
