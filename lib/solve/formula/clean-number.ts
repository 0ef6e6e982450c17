/**
 * Drops floating-point noise beyond 15 significant digits (3 in → m → in gives
 * 2.9999999999999996) so exported values read as the author expects; never -0.
 */
export function cleanNumber(x: number): number {
  if (x === 0) return 0;
  const y = Number(x.toPrecision(15));
  return y === 0 ? 0 : y;
}
