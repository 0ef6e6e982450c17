import { SolveError } from "../errors";
import { cyclePath } from "./cycle-path";
import type { BrokenReference, CalcCycle, CalcGraph, GraphCalc } from "./graph-types";
import { stableOrder } from "./stable-order";
import { stronglyConnected } from "./strongly-connected";

/**
 * Resolves the references between a package's calcs: an evaluation order
 * (dependencies first, otherwise package order), the cycles, and the
 * references to calcs or values that are not there, each reported on the calc
 * that has it. Throws SolveError INVALID for duplicate ids or labels.
 */
export function buildCalcGraph(calcs: readonly GraphCalc[]): CalcGraph {
  const byLabel = indexCalcs(calcs);
  const broken: BrokenReference[] = [];
  const edges = calcs.map((calc) => {
    const targets = new Set<number>();
    for (const reference of calc.references) {
      const dot = reference.indexOf(".");
      const label = dot < 0 ? reference : reference.slice(0, dot);
      const value = dot < 0 ? undefined : reference.slice(dot + 1);
      const target = byLabel.get(label);
      if (target === undefined) {
        broken.push({ calc: calc.id, reference, message: `${label} is not in this package` });
        continue;
      }
      const exported = calcs[target].exports;
      if (value !== undefined && exported && !exported.includes(value)) {
        broken.push({ calc: calc.id, reference, message: `${label} has no value ${value}` });
        continue;
      }
      targets.add(target);
    }
    return [...targets].sort((a, b) => a - b);
  });

  const component = stronglyConnected(calcs.length, edges);
  const size = new Map<number, number>();
  for (const c of component) size.set(c, (size.get(c) ?? 0) + 1);
  const cycles: CalcCycle[] = [];
  calcs.forEach((calc, i) => {
    if ((size.get(component[i]) ?? 0) < 2 && !edges[i].includes(i)) return;
    const path = cyclePath(i, edges, component).map((j) => calcs[j].label);
    cycles.push({ calc: calc.id, path, message: path.join(" → ") });
  });

  const dependents: number[][] = calcs.map(() => []);
  edges.forEach((targets, i) => targets.forEach((t) => dependents[t].push(i)));
  const ids = (list: number[]) => list.map((j) => calcs[j].id);
  return {
    order: ids(stableOrder(edges, component)),
    cycles,
    broken,
    dependsOn: Object.fromEntries(calcs.map((c, i) => [c.id, ids(edges[i])])),
    dependents: Object.fromEntries(calcs.map((c, i) => [c.id, ids(dependents[i])])),
    labels: Object.fromEntries(calcs.map((c) => [c.id, c.label])),
  };
}

function indexCalcs(calcs: readonly GraphCalc[]): Map<string, number> {
  if (!Array.isArray(calcs)) throw new SolveError("INVALID", "calcs must be a list", { path: "calcs" });
  const ids = new Set<string>();
  const byLabel = new Map<string, number>();
  calcs.forEach((calc, i) => {
    const path = `calcs[${i}]`;
    if (typeof calc?.id !== "string" || calc.id === "") throw new SolveError("INVALID", "a calc needs an id", { path: `${path}.id` });
    if (ids.has(calc.id)) throw new SolveError("INVALID", `calc id ${calc.id} is used twice`, { path: `${path}.id` });
    ids.add(calc.id);
    if (typeof calc.label !== "string" || calc.label === "" || calc.label.includes(".")) {
      throw new SolveError("INVALID", "a calc needs a label without dots", { path: `${path}.label` });
    }
    if (byLabel.has(calc.label)) throw new SolveError("INVALID", `label ${calc.label} is used twice`, { path: `${path}.label` });
    byLabel.set(calc.label, i);
    if (!Array.isArray(calc.references) || calc.references.some((r: unknown) => typeof r !== "string")) {
      throw new SolveError("INVALID", "references must be a list of labels", { path: `${path}.references` });
    }
  });
  return byLabel;
}
