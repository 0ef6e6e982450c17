/**
 * One addend of a typeset sum: its sign, its value, and its LaTeX body —
 * a function, so that sums with thousands of addends, shown only as their
 * total, never format the addends.
 */
export type TexTerm = { body: () => string; sign: 1 | -1; value: number };

/** Most addends written out in full; beyond this, the loads are shown as their total. */
export const MAX_WRITTEN_TERMS = 12;

/** `a + b - c …` from terms, "0" when there are none. */
export function texSum(terms: TexTerm[]): string {
  if (!terms.length) return "0";
  return terms.map((t, i) => (i === 0 ? (t.sign < 0 ? "-" : "") : t.sign < 0 ? " - " : " + ") + t.body()).join("");
}

/** Σ sign·value of the terms. */
export function termTotal(terms: TexTerm[]): number {
  return terms.reduce((s, t) => s + t.sign * t.value, 0);
}
