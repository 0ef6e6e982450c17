import { texQty } from "../latex";

/**
 * One addend of a typeset sum: its sign, its value, and either its LaTeX
 * (`tex`) or the quantities whose product it is (`factors`, each a value and
 * a unit). Factors are typeset only when the sum is written out, so a sum
 * of thousands of addends shown as its total never formats them.
 */
export type TexTerm = { sign: 1 | -1; value: number; tex?: string; factors?: [number, string][] };

/** Most addends written out in full; beyond this, the loads are shown as their total. */
export const MAX_WRITTEN_TERMS = 12;

/** A quantity in parentheses, ready to multiply or add. */
export function texFactor(value: number, unit: string): string {
  return `(${texQty(value, unit)})`;
}

/** `a + b - c …` from terms, "0" when there are none. */
export function texSum(terms: TexTerm[]): string {
  if (!terms.length) return "0";
  return terms.map((t, i) => (i === 0 ? (t.sign < 0 ? "-" : "") : t.sign < 0 ? " - " : " + ") + termTex(t)).join("");
}

/** Σ sign·value of the terms. */
export function termTotal(terms: TexTerm[]): number {
  let total = 0;
  for (const t of terms) total += t.sign * t.value;
  return total;
}

function termTex(t: TexTerm): string {
  return (t.tex ?? "") + (t.factors ?? []).map(([v, u]) => texFactor(v, u)).join("");
}
