import type { CalcNode, CalcResult } from "@/lib/calcs/calc-types";
import { locateCalcs } from "@/lib/calcs/locate-calcs";
import { canonicalJson } from "../canonical-json";
import { changedValues } from "./governing-values";
import type { CalcChange, Snapshot } from "./snapshot";

/**
 * Per-calc changes, matched by calc id: added, removed, inputs changed, or
 * results changed with the same inputs (an upstream calc moved it). A calc
 * whose inputs and results are the same on both sides is not listed.
 */
export function compareCalcs(older: Snapshot, newer: Snapshot): CalcChange[] {
  const a = calcsById(older.document);
  const b = calcsById(newer.document);
  const out: CalcChange[] = [];
  for (const [id, { calc, index }] of b) {
    const was = a.get(id);
    const oldResult = older.results[id];
    const newResult = newer.results[id];
    if (!was) {
      out.push({ calcId: id, label: calc.label, kind: calc.kind, change: "added", inputsChanged: true, resultsChanged: true, values: changedValues(undefined, newResult), newIndex: index });
      continue;
    }
    const inputsChanged = canonicalJson(was.calc.inputs) !== canonicalJson(calc.inputs);
    const resultsChanged = resultKey(oldResult) !== resultKey(newResult);
    if (!inputsChanged && !resultsChanged) continue;
    out.push({
      calcId: id,
      label: calc.label,
      kind: calc.kind,
      change: inputsChanged ? "inputsChanged" : "resultsChanged",
      inputsChanged,
      resultsChanged,
      values: changedValues(oldResult, newResult),
      newIndex: index,
    });
  }
  for (const [id, { calc }] of a) {
    if (!b.has(id)) out.push({ calcId: id, label: calc.label, kind: calc.kind, change: "removed", inputsChanged: true, resultsChanged: true, values: changedValues(older.results[id], undefined), newIndex: null });
  }
  return out;
}

/** Everything derived that a reader sees (status, values, working, tables, messages); the label is compared as part of the results. */
function resultKey(r: CalcResult | undefined): string {
  if (!r) return "missing";
  return canonicalJson({ label: r.label, status: r.status, exports: r.exports, steps: r.steps, view: r.view, messages: r.messages, fieldErrors: r.fieldErrors });
}

/** Calcs by id with the top-level block they sit in (the first one wins if an id repeats, as in evaluation). */
function calcsById(document: unknown): Map<string, { calc: CalcNode; index: number }> {
  const out = new Map<string, { calc: CalcNode; index: number }>();
  for (const { calc, path } of locateCalcs(document)) {
    if (out.has(calc.id)) continue;
    const top = /^content\[(\d+)\]/.exec(path);
    out.set(calc.id, { calc, index: top ? Number(top[1]) : 0 });
  }
  return out;
}
