import type { CalcKind, CalcNode, CalcResult, PackageEvaluation } from "@/lib/calcs/calc-types";
import { calcLabelPrefix } from "@/lib/calcs/calc-types";
import { evaluateCalcs } from "@/lib/calcs/evaluate-calcs";
import { extractCalcs } from "@/lib/calcs/extract-calcs";
import { demoFootbridgeDocument } from "@/lib/document/demo-footbridge-document";

/**
 * Seed helpers for the calc tests: each call builds fresh objects, so a test
 * may change them freely.
 */

let counter = 0;

/** A calc node with a fresh id; the label defaults to the kind's prefix and 1. */
export function seedCalc(kind: CalcKind, inputs: unknown, label = `${calcLabelPrefix[kind]}1`): CalcNode {
  counter += 1;
  return { id: `seed-${kind}-${String(counter).padStart(6, "0")}`, kind, label, inputs };
}

/** The calcs of the demo footbridge package, in document order (T1, C1, S1, J1, F1, M1, D1). */
export function demoCalcs(): CalcNode[] {
  return extractCalcs(demoFootbridgeDocument());
}

/** The demo calc with this label. */
export function demoCalc(label: string, calcs: CalcNode[] = demoCalcs()): CalcNode {
  const found = calcs.find((c) => c.label === label);
  if (!found) throw new Error(`the demo has no calc ${label}`);
  return found;
}

/** Evaluates a package and returns the result of the calc with `label`. */
export function resultOf(evaluation: PackageEvaluation, label: string): CalcResult {
  const found = Object.values(evaluation.results).find((r) => r.label === label);
  if (!found) throw new Error(`no result for ${label}`);
  return found;
}

/** Evaluates the calcs and returns the result of the last one: the calc under test, after what it reads. */
export function evaluateLast(...calcs: CalcNode[]): CalcResult {
  const evaluation = evaluateCalcs({ calcs });
  return evaluation.results[calcs[calcs.length - 1].id];
}

/** A quantity export's value, failing the test when it is missing or not a quantity. */
export function valueOf(result: CalcResult, name: string): number {
  const v = result.exports[name];
  if (!v || v.type !== "quantity") throw new Error(`${result.label} exports no quantity ${name} (has ${Object.keys(result.exports).slice(0, 12).join(", ")})`);
  return v.value;
}

/** Every number anywhere in a value, for checking that none is NaN or infinite. */
export function allNumbers(value: unknown, out: number[] = []): number[] {
  if (typeof value === "number") out.push(value);
  else if (Array.isArray(value)) for (const v of value) allNumbers(v, out);
  else if (typeof value === "object" && value !== null) for (const v of Object.values(value)) allNumbers(v, out);
  return out;
}
