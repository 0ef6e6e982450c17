import type { BandLdlt } from "./factor-band-ldlt";

/**
 * The singular direction revealed by the zero pivot at `row`: x = L⁻ᵀ·e_row,
 * so that K·x = L·D·e_row ≈ 0. Entries after `row` are zero, entries of rows
 * grounded earlier are zero, and x[row] = 1.
 */
export function bandNullVector(factor: BandLdlt, row: number): Float64Array {
  const { n, b, data } = factor;
  const w = b + 1;
  const x = new Float64Array(n);
  x[row] = 1;
  for (let i = row; i >= 0; i--) {
    const xi = x[i];
    if (xi === 0) continue;
    const base = i * w;
    for (let k = Math.max(0, i - b); k < i; k++) x[k] -= data[base + k - i + b] * xi;
  }
  return x;
}
