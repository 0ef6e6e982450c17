/**
 * The shortest way from a node back to itself inside its strongly connected
 * component (breadth-first, lowest index first, so the path is reproducible):
 * the node indexes around the cycle, starting and ending at `start`.
 */
export function cyclePath(start: number, edges: readonly (readonly number[])[], component: readonly number[]): number[] {
  const cameFrom = new Map<number, number>();
  const queue = [start];
  for (let head = 0; head < queue.length; head++) {
    const v = queue[head];
    for (const w of edges[v]) {
      if (component[w] !== component[start]) continue;
      if (w === start) return [...walkBack(v, start, cameFrom), start];
      if (cameFrom.has(w)) continue;
      cameFrom.set(w, v);
      queue.push(w);
    }
  }
  return [start];
}

function walkBack(end: number, start: number, cameFrom: ReadonlyMap<number, number>): number[] {
  const path = [end];
  for (let v = end; v !== start; ) {
    const prev = cameFrom.get(v);
    if (prev === undefined) break;
    path.push(prev);
    v = prev;
  }
  return path.reverse();
}
