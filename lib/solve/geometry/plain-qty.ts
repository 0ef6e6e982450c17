import { DISPLAY_SIG_FIGS } from "../latex";

/** A quantity for the words line of a step, rounded like the typeset one (e.g. "13.33 kN"). */
export function plainQty(x: number, unit = ""): string {
  const n = Math.abs(x) < 1e-12 ? "0" : String(Number(x.toPrecision(DISPLAY_SIG_FIGS)));
  return unit ? `${n} ${unit}` : n;
}
