/** Share of a result's scale below which a value is round-off and reported as exactly zero. */
export const ROUND_OFF_SHARE = 1e-9;

/** `value`, or 0 when it is round-off against `scale` (and never −0). */
export function cleanRoundOff(value: number, scale: number): number {
  return Math.abs(value) <= ROUND_OFF_SHARE * scale ? 0 : value;
}
