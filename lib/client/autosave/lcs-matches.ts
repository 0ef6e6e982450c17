/**
 * For each item of `a`, the index of the item of `b` it is matched with in a
 * longest common subsequence, or -1. Matches increase in both lists, which is
 * what a three-way merge needs. Common ends are matched first so a long
 * document with a few edits costs little more than a scan.
 */
export function lcsMatches(a: readonly string[], b: readonly string[]): Int32Array {
  const matches = new Int32Array(a.length).fill(-1);
  let start = 0;
  while (start < a.length && start < b.length && a[start] === b[start]) {
    matches[start] = start;
    start++;
  }
  let endA = a.length;
  let endB = b.length;
  while (endA > start && endB > start && a[endA - 1] === b[endB - 1]) {
    endA--;
    endB--;
    matches[endA] = endB;
  }
  const rows = endA - start;
  const cols = endB - start;
  if (rows === 0 || cols === 0) return matches;

  // lengths[i * (cols + 1) + j]: LCS length of a[start + i..endA) and b[start + j..endB).
  const width = cols + 1;
  const lengths = new Uint32Array((rows + 1) * width);
  for (let i = rows - 1; i >= 0; i--) {
    for (let j = cols - 1; j >= 0; j--) {
      lengths[i * width + j] =
        a[start + i] === b[start + j]
          ? lengths[(i + 1) * width + j + 1] + 1
          : Math.max(lengths[(i + 1) * width + j], lengths[i * width + j + 1]);
    }
  }
  let i = 0;
  let j = 0;
  while (i < rows && j < cols) {
    if (a[start + i] === b[start + j]) {
      matches[start + i] = start + j;
      i++;
      j++;
    } else if (lengths[(i + 1) * width + j] >= lengths[i * width + j + 1]) i++;
    else j++;
  }
  return matches;
}
