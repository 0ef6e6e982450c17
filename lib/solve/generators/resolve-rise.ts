/**
 * The height a sloped chord gains over its horizontal run, from either a rise
 * or a pitch (rise per unit run). The schema has already made sure exactly one
 * is given; `fallback` covers the optional scissors bottom chord.
 */
export function resolveRise(slope: { rise?: number; pitch?: number }, run: number, fallback = 0): number {
  if (slope.rise !== undefined) return slope.rise;
  if (slope.pitch !== undefined) return slope.pitch * run;
  return fallback;
}
