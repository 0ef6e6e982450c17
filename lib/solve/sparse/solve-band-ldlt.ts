import type { BandLdlt } from "./factor-band-ldlt";

/**
 * Solves K·x = rhs with a factor from `factorBandLdlt`, in O(n·b). The factor
 * is reused for every right-hand side, which is how all load cases share one
 * factorization. Returns a new array.
 */
export function solveBandLdlt(factor: BandLdlt, rhs: ArrayLike<number>): Float64Array {
  const { n, b, data } = factor;
  const w = b + 1;
  const x = Float64Array.from(rhs);
  for (let i = 0; i < n; i++) {
    const row = i * w;
    let s = x[i];
    for (let k = Math.max(0, i - b); k < i; k++) s -= data[row + k - i + b] * x[k];
    x[i] = s;
  }
  for (let i = 0; i < n; i++) x[i] /= data[i * w + b];
  for (let i = n - 1; i >= 0; i--) {
    const xi = x[i];
    if (xi === 0) continue;
    const row = i * w;
    for (let k = Math.max(0, i - b); k < i; k++) x[k] -= data[row + k - i + b] * xi;
  }
  return x;
}
