/** A combination's factors as printed: "1.35·G + 1.5·Q"; cases with a zero factor are left out. */
export function combinationExpression(factors: Record<string, number>): string {
  const terms = Object.entries(factors).filter(([, f]) => f !== 0).map(([id, f]) => `${Number(f.toFixed(4))}·${id}`);
  return terms.length ? terms.join(" + ").replace(/\+ -/g, "− ") : "0";
}
