import type { PreparedInputs } from "./calc-kind-module";
import { calcRegistry } from "./calc-registry";
import type { CalcKind, CalcNode } from "./calc-types";

/** A calc's parsed inputs, remembered with the kind they were parsed for. */
export type PreparedEntry = { kind: CalcKind; prepared: PreparedInputs };

/**
 * Parses a calc's inputs with its kind's schema. `unchanged` is the entry
 * from the previous evaluation when the caller says this calc did not change:
 * it is reused as it is, even though the editor hands over a fresh copy of
 * the same inputs on every keystroke. A calc said to have changed is always
 * parsed again, so inputs edited in place are never read stale.
 */
export function prepareCalc(calc: CalcNode, unchanged: PreparedEntry | undefined): PreparedEntry {
  if (unchanged && unchanged.kind === calc.kind) return unchanged;
  return { kind: calc.kind, prepared: calcRegistry[calc.kind].prepare(calc.inputs) };
}
