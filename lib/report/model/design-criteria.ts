import type { CalcNode, CalcResult } from "../../calcs/calc-types";
import type { CombinationsView } from "../../calcs/combinations/combinations-view";
import type { DesignCriteria } from "../report-model";
import { combinationExpression } from "./combination-expression";
import { calcCodes } from "./calc-codes";
import { calcMaterials } from "./calc-materials";
import { loadCaseCriteria } from "./load-case-criteria";

type Ref = { code: string; edition: string; clause: string };

/**
 * The design criteria summary: codes and editions from the standard
 * references in the text and from what the calcs apply, materials, load cases
 * and combinations, each with the calcs that use it.
 */
export function designCriteria(refs: Ref[], calcs: CalcNode[], results: Record<string, CalcResult>): DesignCriteria {
  const codes = new Map<string, { code: string; edition: string; clauses: string[] }>();
  const add = (r: Ref) => {
    const key = `${r.code}\u0000${r.edition}`;
    const entry = codes.get(key) ?? { code: r.code, edition: r.edition, clauses: [] };
    for (const c of r.clause.split(/,\s*/).map((s) => s.trim()).filter(Boolean)) if (!entry.clauses.includes(c)) entry.clauses.push(c);
    codes.set(key, entry);
  };
  refs.forEach(add);
  calcs.forEach((c) => calcCodes(c).forEach(add));

  const combinations: DesignCriteria["combinations"] = [];
  for (const calc of calcs) {
    const r = results[calc.id];
    if (calc.kind !== "combinations" || r?.status !== "ok") continue;
    const view = r.view as CombinationsView;
    const readers = calcs.filter((c) => c.kind === "memberDesign" && (c.inputs as { source?: string }).source === calc.label).map((c) => c.label);
    for (const c of view.combinations) combinations.push({ name: c.name, expression: combinationExpression(c.factors), usedBy: [calc.label, ...readers] });
  }
  return { codes: [...codes.values()], materials: calcMaterials(calcs, results), loadCases: loadCaseCriteria(calcs, results), combinations };
}
