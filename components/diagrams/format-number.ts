/**
 * A number for diagram labels: `sig` significant figures but never rounding
 * away integer digits (1234 stays 1234), a true minus sign, no exponent.
 */
export function formatNumber(x: number, sig = 3): string {
  if (!Number.isFinite(x)) return "—";
  const abs = Math.abs(x);
  if (abs < 1e-9) return "0";
  const digits = Math.min(9, Math.max(0, sig - 1 - Math.floor(Math.log10(abs))));
  let s = abs.toFixed(digits);
  if (s.includes(".")) s = s.replace(/0+$/, "").replace(/\.$/, "");
  if (s === "0") return "0";
  return x < 0 ? `\u2212${s}` : s;
}
