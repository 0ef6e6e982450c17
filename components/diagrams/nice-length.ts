/**
 * The longest 1, 2 or 5 × 10ⁿ not above `target`: a scale bar length a reader
 * can take in at a glance. Returns 0 for a non-positive or non-finite target.
 */
export function niceLength(target: number): number {
  if (!(target > 0) || !Number.isFinite(target)) return 0;
  const power = 10 ** Math.floor(Math.log10(target));
  const steps = [5, 2, 1];
  for (const s of steps) if (s * power <= target * (1 + 1e-12)) return clean(s * power);
  return clean(power);
}

/** Removes binary noise such as 0.30000000000000004 from a 1-2-5 value. */
function clean(v: number): number {
  return Number(v.toPrecision(12));
}
