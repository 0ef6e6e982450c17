/**
 * A number for tables and summaries: `sig` significant figures without
 * rounding away integer digits (1234 stays 1234), a true minus sign, and a
 * power of ten only for magnitudes no table column should spell out.
 */
export function formatFigure(x: number, sig = 4): string {
  if (!Number.isFinite(x)) return "—";
  const abs = Math.abs(x);
  // Solver round-off on a zero-force member must read as 0, not as −1.2×10⁻¹³.
  if (abs < 1e-9) return "0";
  if (abs >= 1e7 || abs < 1e-4) {
    const [m, e] = abs.toExponential(sig - 1).split("e");
    return `${x < 0 ? "\u2212" : ""}${trimZeros(m)}×10${superscript(Number(e))}`;
  }
  const digits = Math.min(9, Math.max(0, sig - 1 - Math.floor(Math.log10(abs))));
  const s = trimZeros(abs.toFixed(digits));
  if (s === "0") return "0";
  return x < 0 ? `\u2212${s}` : s;
}

/** The same figure with its unit after a thin space, e.g. "−322.2 kN". */
export function formatQuantity(x: number, unit: string, sig = 4): string {
  const u = unit.trim().replace(/\^2\b/g, "²").replace(/\^3\b/g, "³").replace(/\*/g, "·");
  return u ? `${formatFigure(x, sig)}\u2009${u}` : formatFigure(x, sig);
}

function trimZeros(s: string): string {
  return s.includes(".") ? s.replace(/0+$/, "").replace(/\.$/, "") : s;
}

const SUPERSCRIPTS = "⁰¹²³⁴⁵⁶⁷⁸⁹";

function superscript(n: number): string {
  const digits = String(Math.abs(n)).replace(/\d/g, (d) => SUPERSCRIPTS[Number(d)]);
  return n < 0 ? `⁻${digits}` : digits;
}
