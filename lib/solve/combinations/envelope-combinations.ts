import { combinationName } from "./combination-name";
import { factorSignature } from "./factor-signature";
import type { Combination, FactorRule } from "./types";

/**
 * Applies each rule twice: for the maximum, every action takes whichever of
 * its two factors gives the larger contribution (variable actions that
 * relieve drop to 0, permanent ones to γG,inf); for the minimum, the smaller.
 * Ties keep the unfavourable factor. Identical factor sets are kept once.
 */
export function envelopeCombinations(rules: FactorRule[], values: Record<string, number>, order: string[]): Combination[] {
  const out: Combination[] = [];
  const seen = new Set<string>();
  for (const rule of rules) {
    for (const sense of ["max", "min"] as const) {
      const factors: Record<string, number> = {};
      let value = 0;
      for (const id of order) {
        const { unfavourable: u, favourable: f } = rule.factors[id];
        const v = values[id];
        const takeUnfavourable = sense === "max" ? u * v >= f * v : u * v <= f * v;
        factors[id] = takeUnfavourable ? u : f;
        value += factors[id] * v;
      }
      const key = factorSignature(factors);
      if (seen.has(key)) continue;
      seen.add(key);
      out.push({ name: combinationName(rule.label, factors, order), source: rule.source, factors, value: value + 0 });
    }
  }
  return out;
}
