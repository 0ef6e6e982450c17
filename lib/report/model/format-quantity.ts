import { formatNumber } from "@/components/diagrams/format-number";

/** Fixed decimals with a true minus sign; "—" for anything not finite (a report never prints NaN). */
export function fixed(x: number | null | undefined, decimals = 1): string {
  if (x === null || x === undefined || !Number.isFinite(x)) return "—";
  const rounded = Number(x.toFixed(decimals));
  if (rounded === 0) return (0).toFixed(decimals);
  const s = Math.abs(rounded).toFixed(decimals);
  return rounded < 0 ? `\u2212${s}` : s;
}

/** Significant figures without rounding away integer digits, as the diagrams print them; "—" for non-finite values. */
export function sig(x: number | null | undefined, figures = 4): string {
  return x === null || x === undefined ? "—" : formatNumber(x, figures);
}

/** A unit as printed: mathjs syntax to typography (kN*m → kN·m, mm^2 → mm²). */
export function printUnit(unit: string): string {
  return unit.replace(/\*/g, "·").replace(/\^2/g, "²").replace(/\^3/g, "³").replace(/\^4/g, "⁴");
}

/** "T", "C" or "0" after a force, the sheet's short sense mark. */
export function senseMark(sense: "tension" | "compression" | "zero"): string {
  return sense === "tension" ? "T" : sense === "compression" ? "C" : "0";
}
