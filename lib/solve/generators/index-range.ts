/** The whole numbers from `from` to `to`, both included (empty when `to < from`). */
export function indexRange(from: number, to: number): number[] {
  return Array.from({ length: Math.max(0, to - from + 1) }, (_, k) => from + k);
}
