/**
 * Topological order of the components, dependencies first, and among the
 * components ready at the same time the one earliest in the package first, so
 * the order only moves a calc when a reference forces it. Members of one
 * component (a cycle) are listed together in package order.
 * `edges[i]` lists what node i depends on.
 */
export function stableOrder(edges: readonly (readonly number[])[], component: readonly number[]): number[] {
  const count = component.reduce((m, c) => Math.max(m, c + 1), 0);
  const members: number[][] = Array.from({ length: count }, () => []);
  component.forEach((c, i) => members[c].push(i));
  const waitingOn = new Array<number>(count).fill(0);
  const unblocks: Set<number>[] = Array.from({ length: count }, () => new Set());
  edges.forEach((targets, i) => {
    for (const t of targets) {
      const from = component[i];
      const to = component[t];
      if (from === to || unblocks[to].has(from)) continue;
      unblocks[to].add(from);
      waitingOn[from]++;
    }
  });

  // Each component's first member's package position decides ties.
  const ready = members.flatMap((m, c) => (waitingOn[c] === 0 ? [c] : []));
  const order: number[] = [];
  while (ready.length > 0) {
    let best = 0;
    for (let k = 1; k < ready.length; k++) if (members[ready[k]][0] < members[ready[best]][0]) best = k;
    const [c] = ready.splice(best, 1);
    order.push(...members[c]);
    for (const next of unblocks[c]) if (--waitingOn[next] === 0) ready.push(next);
  }
  return order;
}
