import { cartesian } from "./cartesian";
import { EN1990_SET_B } from "./en1990-factors";
import { factorSignature } from "./factor-signature";
import { defaultPsi0 } from "./psi-factors";
import type { FactorRule, LoadAction } from "./types";

type Variant = "6.10" | "6.10ab";

/**
 * EN 1990:2002 §6.4.3.2 with the set B factors of Table A1.2(B): each variable
 * action in turn leading (γQ = 1.5), one action of every other variable kind
 * accompanying (γQ ψ0), permanent actions at γG,sup where they add and γG,inf
 * where they relieve. `6.10ab` gives both 6.10a (all variable actions
 * accompanying, 1.35 G) and 6.10b (ξ·1.35 G with a leading action); the
 * envelope takes the less favourable.
 */
export function en1990FactorRules(variant: Variant, actions: LoadAction[]): FactorRule[] {
  const { gammaGsup, gammaGinf, gammaQ, xi } = EN1990_SET_B;
  const groups = new Map<string, LoadAction[]>();
  for (const a of actions) if (a.kind !== "G") groups.set(a.kind, [...(groups.get(a.kind) ?? []), a]);
  const psi0 = (a: LoadAction): number => a.psi0 ?? defaultPsi0[a.kind as keyof typeof defaultPsi0];

  const rules: FactorRule[] = [];
  const seen = new Set<string>();
  const add = (label: string, gSup: number, leading: LoadAction | null, accompanying: LoadAction[]): void => {
    const factors: FactorRule["factors"] = {};
    for (const a of actions) factors[a.id] = a.kind === "G" ? { unfavourable: gSup, favourable: gammaGinf } : { unfavourable: 0, favourable: 0 };
    if (leading) factors[leading.id] = { unfavourable: gammaQ, favourable: 0 };
    for (const a of accompanying) factors[a.id] = { unfavourable: gammaQ * psi0(a), favourable: 0 };
    const key = factorSignature(factors);
    if (seen.has(key)) return;
    seen.add(key);
    const lead = leading ? `, ${leading.id} leading` : "";
    rules.push({ label, source: `EN 1990:2002 Eq. ${label} with Table A1.2(B)${lead}`, factors });
  };
  const accompanyingPicks = (except: string | null): LoadAction[][] =>
    cartesian([...groups.entries()].filter(([kind]) => kind !== except).map(([, list]) => list));
  const leadingCases = (label: string, gSup: number): void => {
    for (const leading of actions.filter((a) => a.kind !== "G")) {
      for (const pick of accompanyingPicks(leading.kind)) add(label, gSup, leading, pick);
    }
  };

  if (variant === "6.10") {
    add("6.10", gammaGsup, null, []);
    leadingCases("6.10", gammaGsup);
  } else {
    for (const pick of accompanyingPicks(null)) add("6.10a", gammaGsup, null, pick);
    leadingCases("6.10b", xi * gammaGsup);
  }
  return rules;
}
