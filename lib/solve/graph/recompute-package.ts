import { affectedBy } from "./affected-by";
import { buildCalcGraph } from "./build-calc-graph";
import type { GraphCalc } from "./graph-types";
import type { CalcIssue, CalcOutcome, PackageRecompute, RecomputePackageOptions } from "./recompute-types";

/**
 * Recomputes a package in dependency order, feeding each calc the exports of
 * the calcs it references. With `changed` (and `previous`), only the changed
 * calcs and those downstream are evaluated; the rest keep their previous
 * outcome. Broken references, cycles and failures are reported on the calc
 * that has them, and the calcs reading it are marked blocked. Pure apart from
 * whatever `evaluate` does.
 */
export function recomputePackage<C extends GraphCalc, V>(options: RecomputePackageOptions<C, V>): PackageRecompute<V> {
  const { calcs, evaluate, previous, changed } = options;
  const graph = buildCalcGraph(calcs);
  const byId = new Map(calcs.map((c) => [c.id, c]));
  const byLabel = new Map(calcs.map((c) => [c.label, c.id]));

  const structural = new Map<string, CalcIssue[]>();
  const note = (id: string, issue: CalcIssue) => structural.set(id, [...(structural.get(id) ?? []), issue]);
  for (const b of graph.broken) note(b.calc, { kind: "broken", message: b.message, reference: b.reference });
  for (const c of graph.cycles) note(c.calc, { kind: "cycle", message: c.message, path: c.path });

  const before = previous?.results ?? {};
  let toRun: Set<string>;
  if (changed === undefined) {
    toRun = new Set(graph.order);
  } else {
    // A calc with no usable previous outcome, or with a problem now, is re-checked as if it had changed.
    const seeds = new Set(changed);
    for (const id of graph.order) if (!Object.hasOwn(before, id) || before[id].status !== "ok" || structural.has(id)) seeds.add(id);
    toRun = new Set(affectedBy(graph, seeds));
  }

  const results: Record<string, CalcOutcome<V>> = {};
  const recomputed: string[] = [];
  for (const id of graph.order) {
    const calc = byId.get(id);
    if (!calc) continue;
    if (!toRun.has(id)) {
      results[id] = { ...before[id], label: calc.label };
      continue;
    }
    recomputed.push(id);
    results[id] = run(calc);
  }
  return { graph, recomputed, results };

  function run(calc: C): CalcOutcome<V> {
    const base = { id: calc.id, label: calc.label, exports: {} };
    const own = structural.get(calc.id);
    if (own) return { ...base, status: "error", issues: own };
    const upstream = graph.dependsOn[calc.id].filter((d) => results[d].status !== "ok");
    if (upstream.length > 0) {
      const issues = upstream.map((d): CalcIssue => ({ kind: "blocked", message: `depends on ${graph.labels[d]} which has an error` }));
      return { ...base, status: "blocked", issues };
    }
    const inputs: [string, V][] = [];
    const missing: CalcIssue[] = [];
    for (const reference of calc.references) {
      const dot = reference.indexOf(".");
      const label = dot < 0 ? reference : reference.slice(0, dot);
      const exported = results[byLabel.get(label) ?? ""]?.exports ?? {};
      if (dot < 0) {
        for (const [name, value] of Object.entries(exported)) inputs.push([`${label}.${name}`, value]);
      } else if (Object.hasOwn(exported, reference.slice(dot + 1))) {
        inputs.push([reference, exported[reference.slice(dot + 1)]]);
      } else {
        missing.push({ kind: "broken", message: `${label} has no value ${reference.slice(dot + 1)}`, reference });
      }
    }
    if (missing.length > 0) return { ...base, status: "error", issues: missing };
    try {
      return { ...base, status: "ok", exports: evaluate(calc, Object.fromEntries(inputs)), issues: [] };
    } catch (e) {
      // One calc failing must not stop the package: the failure is shown on that calc.
      return { ...base, status: "error", issues: [{ kind: "failed", message: e instanceof Error ? e.message : String(e) }] };
    }
  }
}
