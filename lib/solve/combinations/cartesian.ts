/** Every way of taking one item from each list, in order; `[]` gives one empty pick. */
export function cartesian<T>(lists: T[][]): T[][] {
  return lists.reduce<T[][]>((picks, list) => picks.flatMap((pick) => list.map((item) => [...pick, item])), [[]]);
}
