import type { Adjacency } from "./build-adjacency";

/**
 * Reverse Cuthill–McKee ordering: `order[k]` is the node placed k-th. Each
 * connected component starts from a pseudo-peripheral node (found by repeated
 * breadth-first sweeps), so that the levels are many and narrow and the
 * resulting band is close to the width of one level.
 */
export function reverseCuthillMcKee(graph: Adjacency): Int32Array {
  const { n, offsets, neighbors } = graph;
  const order = new Int32Array(n);
  const placed = new Uint8Array(n);
  const level = new Int32Array(n).fill(-1);
  let count = 0;
  for (let seed = 0; seed < n; seed++) {
    if (placed[seed]) continue;
    const start = pseudoPeripheralNode(graph, seed, level);
    placed[start] = 1;
    order[count++] = start;
    for (let head = count - 1; head < count; head++) {
      const v = order[head];
      const first = count;
      for (let k = offsets[v]; k < offsets[v + 1]; k++) {
        const w = neighbors[k];
        if (!placed[w]) {
          placed[w] = 1;
          order[count++] = w;
        }
      }
      // Cuthill–McKee visits the new neighbours by increasing degree.
      sortByDegree(order, first, count, offsets);
    }
  }
  order.reverse();
  return order;
}

function degreeOf(offsets: Int32Array, v: number): number {
  return offsets[v + 1] - offsets[v];
}

function sortByDegree(order: Int32Array, from: number, to: number, offsets: Int32Array): void {
  if (to - from > 32) {
    order.subarray(from, to).sort((a, b) => degreeOf(offsets, a) - degreeOf(offsets, b));
    return;
  }
  for (let i = from + 1; i < to; i++) {
    const v = order[i];
    const d = degreeOf(offsets, v);
    let j = i - 1;
    while (j >= from && degreeOf(offsets, order[j]) > d) {
      order[j + 1] = order[j];
      j--;
    }
    order[j + 1] = v;
  }
}

/** George–Liu style search: move to a farthest node of least degree until the eccentricity stops growing. */
function pseudoPeripheralNode(graph: Adjacency, seed: number, level: Int32Array): number {
  let node = seed;
  let eccentricity = -1;
  for (let sweep = 0; sweep < 8; sweep++) {
    const { depth, farthest } = breadthFirst(graph, node, level);
    if (depth <= eccentricity) break;
    eccentricity = depth;
    node = farthest;
  }
  return node;
}

function breadthFirst(graph: Adjacency, start: number, level: Int32Array): { depth: number; farthest: number } {
  const { offsets, neighbors } = graph;
  const queue: number[] = [start];
  const visited: number[] = [start];
  level[start] = 0;
  let depth = 0;
  let farthest = start;
  for (let head = 0; head < queue.length; head++) {
    const v = queue[head];
    for (let k = offsets[v]; k < offsets[v + 1]; k++) {
      const w = neighbors[k];
      if (level[w] >= 0) continue;
      level[w] = level[v] + 1;
      queue.push(w);
      visited.push(w);
    }
  }
  for (const v of visited) {
    if (level[v] > depth || (level[v] === depth && degreeOf(offsets, v) < degreeOf(offsets, farthest))) {
      depth = level[v];
      farthest = v;
    }
  }
  for (const v of visited) level[v] = -1;
  return { depth, farthest };
}
