import { DISPLAY_SIG_FIGS } from "../latex";

/** A rounded number for plain text (tables, tooltips): `54`, `0.05`, `1.234×10^8`. */
export function formatPlainNumber(x: number, sig = DISPLAY_SIG_FIGS): string {
  if (x === 0 || Math.abs(x) < 1e-12) return "0";
  const abs = Math.abs(x);
  if (abs >= 1e7 || abs < 1e-4) {
    const [m, e] = x.toExponential(sig - 1).split("e");
    return `${trimZeros(m)}×10^${Number(e)}`;
  }
  const digits = Math.max(0, sig - 1 - Math.floor(Math.log10(abs)));
  const s = trimZeros(x.toFixed(Math.min(digits, 12)));
  return s === "-0" ? "0" : s;
}

function trimZeros(s: string): string {
  return s.includes(".") ? s.replace(/0+$/, "").replace(/\.$/, "") : s;
}
