/**
 * A value during evaluation: its size in SI base units, its dimension and,
 * when the working makes it obvious, the unit the author wrote it in (`hint`),
 * which the result keeps if it is an engineering unit of the package's system.
 * Arithmetic on SI values is exact enough and far faster than mathjs units
 * (which also rename products, `kN·m` becoming `kJ`); mathjs still reads units.
 */
export type Measure = {
  si: number;
  dims: readonly number[];
  hint?: string;
};

const TOLERANCE = 1e-9;

/** Same dimension (exponents may be fractional after a square root). */
export function sameDims(a: readonly number[], b: readonly number[]): boolean {
  return a.every((x, i) => Math.abs(x - b[i]) < TOLERANCE);
}

/** A plain number: every exponent zero. */
export function isDimensionless(dims: readonly number[]): boolean {
  return dims.every((x) => Math.abs(x) < TOLERANCE);
}

/** A key for looking a dimension up in a table, e.g. `1,1,-2,0,0,0,0,0,0` for force. */
export function dimsKey(dims: readonly number[]): string {
  // Called for every line; a plain loop keeps it allocation-light.
  let key = "";
  for (let i = 0; i < dims.length; i++) key += (i ? "," : "") + (Math.round(dims[i] * 1e6) / 1e6 || 0);
  return key;
}
