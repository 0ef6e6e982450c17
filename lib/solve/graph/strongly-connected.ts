/**
 * Strongly connected components of a directed graph (Tarjan), without
 * recursion so a long chain of calcs cannot overflow the stack. `edges[i]`
 * lists the nodes node i points to. Returns each node's component number.
 */
export function stronglyConnected(count: number, edges: readonly (readonly number[])[]): number[] {
  const index = new Array<number>(count).fill(-1);
  const low = new Array<number>(count).fill(0);
  const component = new Array<number>(count).fill(-1);
  const onStack = new Array<boolean>(count).fill(false);
  const stack: number[] = [];
  let nextIndex = 0;
  let nextComponent = 0;

  for (let root = 0; root < count; root++) {
    if (index[root] >= 0) continue;
    // Each frame: a node and how many of its edges have been followed.
    const frames: [number, number][] = [[root, 0]];
    index[root] = low[root] = nextIndex++;
    stack.push(root);
    onStack[root] = true;
    while (frames.length > 0) {
      const frame = frames[frames.length - 1];
      const [v, k] = frame;
      if (k < edges[v].length) {
        frame[1] = k + 1;
        const w = edges[v][k];
        if (index[w] < 0) {
          index[w] = low[w] = nextIndex++;
          stack.push(w);
          onStack[w] = true;
          frames.push([w, 0]);
        } else if (onStack[w]) {
          low[v] = Math.min(low[v], index[w]);
        }
        continue;
      }
      frames.pop();
      if (frames.length > 0) {
        const parent = frames[frames.length - 1][0];
        low[parent] = Math.min(low[parent], low[v]);
      }
      if (low[v] === index[v]) {
        // Everything above v on the stack belongs to v's component.
        for (let w = -1; w !== v; ) {
          w = stack.pop() ?? v;
          onStack[w] = false;
          component[w] = nextComponent;
        }
        nextComponent++;
      }
    }
  }
  return component;
}
