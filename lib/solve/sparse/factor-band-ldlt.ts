import type { BandMatrix } from "./band-matrix";

/** Options for {@link factorBandLdlt}. */
export type FactorBandLdltOptions = {
  /**
   * A pivot no larger than `pivotTolerance` times the original diagonal entry
   * is treated as zero: the matrix is singular in that direction.
   */
  pivotTolerance: number;
};

/**
 * K = L·D·Lᵀ in band storage. `data` holds L below the diagonal (unit
 * diagonal implied) and D on the diagonal. `zeroPivots` lists, in elimination
 * order, the rows whose pivot vanished; each of them was grounded (its column
 * of L set to zero, its pivot to its original diagonal or 1) so that the
 * factorization could go on and reveal every independent singular direction.
 */
export type BandLdlt = {
  /** Order of the matrix. */
  n: number;
  /** Half-bandwidth, as in the factored matrix. */
  b: number;
  /** L below the diagonal and D on it, in the band layout of `BandMatrix`. */
  data: Float64Array;
  /** Rows whose pivot vanished, in elimination order. */
  zeroPivots: number[];
};

/**
 * Factors a symmetric positive semi-definite band matrix without pivoting,
 * in O(n·b²) time and O(n·b) memory; the input matrix is left untouched.
 * For a positive semi-definite matrix a zero pivot means the whole remaining
 * column is zero, so grounding it is exact and the count of zero pivots is
 * the dimension of the null space.
 */
export function factorBandLdlt(matrix: BandMatrix, options: FactorBandLdltOptions): BandLdlt {
  const { n, b } = matrix;
  const w = b + 1;
  const data = matrix.data.slice();
  const zeroPivots: number[] = [];
  const grounded = new Uint8Array(n);
  // u[k] = L(i,k)·d(k) for the row i being factored, indexed by band offset.
  const u = new Float64Array(w);
  for (let i = 0; i < n; i++) {
    const rowI = i * w;
    const lo = Math.max(0, i - b);
    for (let j = lo; j < i; j++) {
      const rowJ = j * w;
      const oj = j - i + b;
      if (grounded[j]) {
        data[rowI + oj] = 0;
        u[oj] = 0;
        continue;
      }
      let s = data[rowI + oj];
      // Columns k of row j sit at offset k − j + b in row j, k − i + b in row i.
      const shift = i - j;
      for (let k = lo; k < j; k++) {
        const ok = k - i + b;
        s -= u[ok] * data[rowJ + ok + shift];
      }
      u[oj] = s;
      data[rowI + oj] = s / data[rowJ + b];
    }
    const original = data[rowI + b];
    let d = original;
    for (let k = lo; k < i; k++) {
      const ok = k - i + b;
      d -= u[ok] * data[rowI + ok];
    }
    if (!(d > options.pivotTolerance * original)) {
      zeroPivots.push(i);
      grounded[i] = 1;
      d = original > 0 ? original : 1;
    }
    data[rowI + b] = d;
  }
  return { n, b, data, zeroPivots };
}
