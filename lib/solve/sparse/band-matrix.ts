/**
 * A symmetric matrix stored by its lower band, row by row. Row `i` holds the
 * entries (i, i − b) … (i, i) in `data[i·(b+1)] … data[i·(b+1) + b]`; entries
 * left of column 0 are unused padding. Storage and work stay proportional to
 * n·b, which is what lets long trusses with a narrow band scale linearly.
 */
export type BandMatrix = {
  /** Order of the matrix. */
  n: number;
  /** Half-bandwidth: the largest |i − j| of a non-zero entry. */
  b: number;
  /** n·(b+1) values, row-major lower band. */
  data: Float64Array;
};

/** A zero symmetric band matrix of order `n` and half-bandwidth `b`. */
export function createBandMatrix(n: number, b: number): BandMatrix {
  const half = Math.max(0, Math.min(b, n - 1));
  return { n, b: half, data: new Float64Array(n * (half + 1)) };
}

/** Adds `value` to entry (i, j) and, by symmetry, (j, i); throws when the entry lies outside the band. */
export function addToBand(matrix: BandMatrix, i: number, j: number, value: number): void {
  const row = Math.max(i, j);
  const col = Math.min(i, j);
  const offset = col - row + matrix.b;
  if (offset < 0) throw new RangeError(`entry (${i}, ${j}) lies outside the band of width ${matrix.b}`);
  matrix.data[row * (matrix.b + 1) + offset] += value;
}

/** Entry (i, j) of the symmetric matrix; zero outside the band. */
export function bandEntry(matrix: BandMatrix, i: number, j: number): number {
  const row = Math.max(i, j);
  const col = Math.min(i, j);
  const offset = col - row + matrix.b;
  return offset < 0 ? 0 : matrix.data[row * (matrix.b + 1) + offset];
}
