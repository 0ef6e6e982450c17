/** `(2) 1.2D + 1.6L + 0.5S`: the label and the terms with a non-zero factor, in action order. */
export function combinationName(label: string, factors: Record<string, number>, order: string[]): string {
  const terms = order.filter((id) => factors[id] !== 0).map((id) => term(factors[id], id));
  return `(${label}) ${terms.length ? terms.join(" + ") : "0"}`;
}

function term(factor: number, id: string): string {
  const shown = Number(factor.toPrecision(5));
  const f = shown === 1 ? "" : String(shown);
  // A factor written straight against an id that starts with a digit would read as one number.
  return /^[A-Za-z]/.test(id) || !f ? `${f}${id}` : `${f}(${id})`;
}
