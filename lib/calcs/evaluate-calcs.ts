import { recomputePackage, type CalcOutcome, type PackageRecompute } from "../solve";
import { calcLabelPattern } from "./calc-label";
import type { PreparedInputs } from "./calc-kind-module";
import { calcKinds, type CalcKind, type CalcNode, type CalcResult, type CalcValue, type PackageEvaluation } from "./calc-types";
import { describeBlocked, describeCalcIssue } from "./describe-calc-issue";
import { errorEvaluation } from "./error-evaluation";
import { failedEvaluation, type KindEvaluation } from "./kind-evaluation";
import { prepareCalc, type PreparedEntry } from "./prepare-calc";

/** Input of {@link evaluateCalcs}. */
export type EvaluateCalcsOptions = {
  /** The package's calcs in document order. Inputs objects are treated as immutable. */
  calcs: CalcNode[];
  /** The last evaluation of this package; with `changed`, unaffected calcs keep their results from it. */
  previous?: PackageEvaluation;
  /** Ids of calcs whose label or inputs changed (or that were added); needs `previous`. */
  changed?: string[];
};

/** A calc as the package graph sees it, with its parsed inputs. */
type GraphEntry = { id: string; label: string; kind: CalcKind; references: string[]; prepared: PreparedInputs };

const KINDS: ReadonlySet<string> = new Set(calcKinds);

// Parsed inputs of each evaluation, so the next incremental one need not parse unchanged calcs again.
const preparedBy = new WeakMap<PackageEvaluation, Map<string, PreparedEntry>>();

/** Thrown inside the graph's evaluate so that a calc with problems counts as an error for its dependents. */
class CalcNotComputed extends Error {}

/**
 * Evaluates a package's calcs in dependency order, each fed the values it
 * references. With `previous` and `changed`, only the changed calcs and those
 * that depend on them are recomputed. Problems are reported on the calc that
 * has them: invalid inputs as field errors; an unstable truss, a broken
 * reference, a cycle or a calc it waits on as messages. Never throws.
 */
export function evaluateCalcs(options: EvaluateCalcsOptions): PackageEvaluation {
  const { calcs, previous, changed } = options;
  const incremental = previous !== undefined && changed !== undefined;
  const changedSet = new Set(changed ?? []);
  const reuse = incremental ? preparedBy.get(previous) : undefined;

  const prepared = new Map<string, PreparedEntry>();
  const rejected = new Map<string, CalcResult>();
  const duplicates = new Set<string>();
  const labels = new Set<string>();
  const entries: GraphEntry[] = [];
  for (const calc of calcs) {
    if (prepared.has(calc.id) || rejected.has(calc.id)) {
      duplicates.add(calc.id);
      continue;
    }
    const problem = identityProblem(calc, labels);
    if (problem) {
      rejected.set(calc.id, resultOf(calc, failedEvaluation({ messages: [problem] })));
      continue;
    }
    labels.add(calc.label);
    const entry = prepareCalc(calc, changedSet.has(calc.id) ? undefined : reuse?.get(calc.id));
    prepared.set(calc.id, entry);
    entries.push({ id: calc.id, label: calc.label, kind: calc.kind, references: [], prepared: entry.prepared });
  }
  for (const e of entries) e.references = e.prepared.ok ? e.prepared.references(labels) : [];

  const details = new Map<string, KindEvaluation>();
  const recompute = recomputePackage<GraphEntry, CalcValue>({
    calcs: entries,
    evaluate: (entry, inputs) => {
      const result = evaluateEntry(entry, inputs);
      details.set(entry.id, result);
      if (result.status !== "ok") throw new CalcNotComputed(entry.label);
      return result.exports;
    },
    previous: incremental ? { results: outcomesOf(previous) } : undefined,
    changed: incremental ? changed : undefined,
  });

  const recomputed = new Set(recompute.recomputed);
  const results: Record<string, CalcResult> = {};
  for (const calc of calcs) {
    if (Object.hasOwn(results, calc.id)) continue;
    const result = rejected.get(calc.id) ?? finalResult(calc, recompute, recomputed, details, previous);
    results[calc.id] = duplicates.has(calc.id)
      ? { ...result, messages: [...result.messages, `Another calc in this package has the same id (${calc.id}); only this one is evaluated.`] }
      : result;
  }
  const evaluation: PackageEvaluation = { results, recomputed: [...recompute.recomputed, ...rejected.keys()] };
  preparedBy.set(evaluation, prepared);
  return evaluation;
}

/** Why a calc cannot take part in the package at all, or null. */
function identityProblem(calc: CalcNode, labels: ReadonlySet<string>): string | null {
  if (!KINDS.has(calc.kind)) return `"${String(calc.kind)}" is not a calc kind.`;
  if (!calcLabelPattern.test(calc.label)) return `The label "${calc.label}" is not valid: use a letter, then letters, digits or _ (at most 16), e.g. T1.`;
  if (labels.has(calc.label)) return `The label ${calc.label} is already used by another calc in this package; rename one of them.`;
  return null;
}

function evaluateEntry(entry: GraphEntry, inputs: Record<string, CalcValue>): KindEvaluation {
  if (!entry.prepared.ok) return failedEvaluation({ fieldErrors: entry.prepared.fieldErrors });
  try {
    return entry.prepared.evaluate(inputs, { label: entry.label });
  } catch (e) {
    // An evaluator should not throw; if one does, the calc shows why instead of the package stopping.
    return errorEvaluation(e, { fields: [] });
  }
}

function finalResult(
  calc: CalcNode,
  recompute: PackageRecompute<CalcValue>,
  recomputed: ReadonlySet<string>,
  details: ReadonlyMap<string, KindEvaluation>,
  previous: PackageEvaluation | undefined,
): CalcResult {
  const kept = previous?.results[calc.id];
  // The same object when nothing changed, so a view memoized on its result does not re-render.
  if (!recomputed.has(calc.id) && kept) return kept.label === calc.label ? kept : { ...kept, label: calc.label };
  const own = details.get(calc.id);
  if (own) return resultOf(calc, own);
  const outcome = recompute.results[calc.id];
  if (outcome.status === "blocked") {
    const waiting = recompute.graph.dependsOn[calc.id].filter((d) => recompute.results[d]?.status !== "ok").map((d) => recompute.graph.labels[d]);
    return resultOf(calc, { ...failedEvaluation({ messages: [describeBlocked(waiting)] }) }, "blocked");
  }
  return resultOf(calc, failedEvaluation({ messages: outcome.issues.map(describeCalcIssue) }));
}

function resultOf(calc: CalcNode, e: KindEvaluation, status: CalcResult["status"] = e.status): CalcResult {
  return { id: calc.id, label: calc.label, kind: calc.kind, status, fieldErrors: e.fieldErrors, messages: e.messages, steps: e.steps, exports: e.exports, view: e.view };
}

function outcomesOf(previous: PackageEvaluation): Record<string, CalcOutcome<CalcValue>> {
  const out: Record<string, CalcOutcome<CalcValue>> = {};
  for (const [id, r] of Object.entries(previous.results)) out[id] = { id, label: r.label, status: r.status, exports: r.exports, issues: [] };
  return out;
}
