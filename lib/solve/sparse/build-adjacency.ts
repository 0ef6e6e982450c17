/**
 * An undirected graph in compressed form: the neighbours of node `v` are
 * `neighbors[offsets[v]] … neighbors[offsets[v + 1] − 1]`.
 */
export type Adjacency = {
  /** Number of nodes. */
  n: number;
  /** n + 1 offsets into `neighbors`. */
  offsets: Int32Array;
  /** Neighbour lists, each sorted ascending, without self-loops or repeats. */
  neighbors: Int32Array;
};

/** Builds the adjacency of `n` nodes joined by `edges` (pairs of node indices); self-loops and repeats are dropped. */
export function buildAdjacency(n: number, edgesFrom: ArrayLike<number>, edgesTo: ArrayLike<number>): Adjacency {
  const degree = new Int32Array(n + 1);
  for (let e = 0; e < edgesFrom.length; e++) {
    if (edgesFrom[e] === edgesTo[e]) continue;
    degree[edgesFrom[e] + 1]++;
    degree[edgesTo[e] + 1]++;
  }
  for (let v = 0; v < n; v++) degree[v + 1] += degree[v];
  const raw = new Int32Array(degree[n]);
  const fill = degree.slice(0, n);
  for (let e = 0; e < edgesFrom.length; e++) {
    const a = edgesFrom[e];
    const b = edgesTo[e];
    if (a === b) continue;
    raw[fill[a]++] = b;
    raw[fill[b]++] = a;
  }
  // Sort each list and squeeze out repeats so that degrees are true degrees.
  const offsets = new Int32Array(n + 1);
  const neighbors = new Int32Array(raw.length);
  let out = 0;
  for (let v = 0; v < n; v++) {
    offsets[v] = out;
    const list = raw.subarray(degree[v], degree[v + 1]).sort();
    for (let k = 0; k < list.length; k++) {
      if (k === 0 || list[k] !== list[k - 1]) neighbors[out++] = list[k];
    }
  }
  offsets[n] = out;
  return { n, offsets, neighbors: neighbors.slice(0, out) };
}
