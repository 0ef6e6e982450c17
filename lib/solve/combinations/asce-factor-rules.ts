import type { AsceTable } from "./asce-template";
import { cartesian } from "./cartesian";
import { factorSignature } from "./factor-signature";
import type { FactorRule } from "./types";

/**
 * Expands an ASCE/SEI 7 table for the given actions: every alternative of
 * every `(… or …)` term, and every choice among variable actions of one kind.
 * D keeps its table factor whether it adds or relieves: the favourable case is
 * covered by the 0.9D (LRFD) and 0.6D (ASD) combinations.
 */
export function asceFactorRules(table: AsceTable, actions: { id: string; kind: string }[]): FactorRule[] {
  const byKind = new Map<string, string[]>();
  for (const a of actions) byKind.set(a.kind, [...(byKind.get(a.kind) ?? []), a.id]);

  const rules: FactorRule[] = [];
  const seen = new Set<string>();
  for (const template of table.templates) {
    for (const choice of cartesian(template.terms)) {
      const kindFactors: Record<string, number> = Object.assign({}, ...choice);
      const variableKinds = Object.keys(kindFactors).filter((k) => k !== "D" && byKind.has(k));
      for (const pick of cartesian(variableKinds.map((k) => byKind.get(k) ?? []))) {
        const factors: FactorRule["factors"] = {};
        for (const a of actions) {
          const f = a.kind === "D" ? (kindFactors.D ?? 0) : 0;
          factors[a.id] = { unfavourable: f, favourable: f };
        }
        pick.forEach((id, i) => {
          factors[id] = { unfavourable: kindFactors[variableKinds[i]], favourable: 0 };
        });
        const key = factorSignature(factors);
        if (seen.has(key)) continue;
        seen.add(key);
        rules.push({ label: template.label, source: `${table.clause}, combination ${template.label}: ${template.expression}`, factors });
      }
    }
  }
  return rules;
}
