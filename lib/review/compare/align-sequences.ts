/** A step of an alignment of two sequences: a kept pair, or an element only on one side. */
export type AlignStep = { op: "same"; a: number; b: number } | { op: "removed"; a: number } | { op: "added"; b: number };

/**
 * Aligns two sequences by their longest common subsequence of equal keys
 * (dynamic programming, O(n·m) — packages have hundreds of blocks, not
 * millions). Within a run of differences, removals come before additions.
 */
export function alignSequences(a: readonly string[], b: readonly string[]): AlignStep[] {
  const n = a.length;
  const m = b.length;
  // lcs[i][j] = length of the LCS of a[i..] and b[j..], in one flat array.
  const lcs = new Uint32Array((n + 1) * (m + 1));
  const at = (i: number, j: number) => i * (m + 1) + j;
  for (let i = n - 1; i >= 0; i--) {
    for (let j = m - 1; j >= 0; j--) {
      lcs[at(i, j)] = a[i] === b[j] ? lcs[at(i + 1, j + 1)] + 1 : Math.max(lcs[at(i + 1, j)], lcs[at(i, j + 1)]);
    }
  }
  const steps: AlignStep[] = [];
  let i = 0;
  let j = 0;
  while (i < n || j < m) {
    if (i < n && j < m && a[i] === b[j]) {
      steps.push({ op: "same", a: i++, b: j++ });
    } else if (j >= m || (i < n && lcs[at(i + 1, j)] >= lcs[at(i, j + 1)])) {
      steps.push({ op: "removed", a: i++ });
    } else {
      steps.push({ op: "added", b: j++ });
    }
  }
  return steps;
}
