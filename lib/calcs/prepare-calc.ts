import type { PreparedInputs } from "./calc-kind-module";
import { calcRegistry } from "./calc-registry";
import type { CalcKind, CalcNode } from "./calc-types";

/** A calc's parsed inputs, remembered with the kind they were parsed for. */
export type PreparedEntry = { kind: CalcKind; prepared: PreparedInputs };

// The same inputs object always parses the same way: parse it once, however often the package is evaluated.
const byInputs = new WeakMap<object, PreparedEntry>();

/**
 * Parses a calc's inputs with its kind's schema, at most once per inputs
 * object. `unchanged` is the entry from the previous evaluation when the
 * caller says this calc did not change: it is reused even if the editor
 * handed over a fresh copy of the same inputs.
 */
export function prepareCalc(calc: CalcNode, unchanged: PreparedEntry | undefined): PreparedEntry {
  const inputs = calc.inputs;
  const key = typeof inputs === "object" && inputs !== null ? inputs : null;
  const known = key ? byInputs.get(key) : undefined;
  if (known && known.kind === calc.kind) return known;
  if (unchanged && unchanged.kind === calc.kind) return unchanged;
  const entry: PreparedEntry = { kind: calc.kind, prepared: calcRegistry[calc.kind].prepare(inputs) };
  if (key) byInputs.set(key, entry);
  return entry;
}
