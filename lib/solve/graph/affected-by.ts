import type { CalcGraph } from "./graph-types";

/**
 * The calcs to recompute after `changed` changed: those calcs and every calc
 * that reads them, directly or through others, in evaluation order. Nothing
 * upstream or beside them. Ids not in the graph are ignored.
 */
export function affectedBy(graph: CalcGraph, changed: Iterable<string>): string[] {
  const reached = new Set<string>();
  const queue: string[] = [];
  for (const id of changed) {
    if (Object.hasOwn(graph.dependents, id) && !reached.has(id)) {
      reached.add(id);
      queue.push(id);
    }
  }
  for (let head = 0; head < queue.length; head++) {
    for (const next of graph.dependents[queue[head]]) {
      if (reached.has(next)) continue;
      reached.add(next);
      queue.push(next);
    }
  }
  return graph.order.filter((id) => reached.has(id));
}
