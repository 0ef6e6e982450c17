/** One signed term of a written-out equation; `tex` is the term's magnitude part. */
export type SignedTerm = { negative: boolean; tex: string };

/**
 * Writes terms as "a - b + c" with a leading minus only when the first term
 * is negative, so equations read the way an engineer would write them.
 * No terms at all is written as 0.
 */
export function joinTerms(terms: SignedTerm[]): string {
  if (terms.length === 0) return "0";
  return terms
    .map((t, i) => (i === 0 ? (t.negative ? `-${t.tex}` : t.tex) : `${t.negative ? "-" : "+"} ${t.tex}`))
    .join(" ");
}
