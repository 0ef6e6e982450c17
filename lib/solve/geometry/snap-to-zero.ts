/**
 * `value`, or exactly 0 when it is round-off against `scale` (a billionth of
 * it), and never −0. A member that is zero by statics then reads "zero
 * force" in the working instead of 1.4e-14 kN.
 */
export function snapToZero(value: number, scale: number): number {
  return Math.abs(value) <= 1e-9 * Math.abs(scale) ? 0 : value + 0;
}
