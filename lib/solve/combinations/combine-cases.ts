import { z } from "zod";
import { parseInput } from "../design/parse-input";
import { SolveError } from "../errors";
import { escapeTex, texQty } from "../latex";
import type { Step } from "../types";
import { checkActions, standardSchema } from "./action-schema";
import { combinationName } from "./combination-name";
import { headerSteps } from "./combination-steps";
import { envelopeCombinations } from "./envelope-combinations";
import { factorSignature } from "./factor-signature";
import { pickExtremes } from "./pick-extremes";
import { standardRules } from "./standard-rules";
import { texText } from "./tex-text";
import type { FactorRule, LoadStandard } from "./types";

/** A load case: its id and kind (kind and ψ0 matter only for a published set). */
export type CombineCase = { id: string; kind: string; psi0?: number };

/** A named set of factors on case ids; cases not named take 0. */
export type CustomFactorSet = { name: string; factors: Record<string, number> };

/**
 * Per-case result vectors (member forces, reactions, displacements: any
 * quantity that superposes) combined by a published set or by custom factors.
 */
export type CombineCasesOptions = (
  | { standard: LoadStandard; factorSets?: undefined }
  | { factorSets: CustomFactorSet[]; standard?: undefined }
) & {
  cases: CombineCase[];
  /** results[caseId][key]: every case must give the same keys. */
  results: Record<string, Record<string, number>>;
  /** Unit label of the values, for the steps. */
  units?: string;
};

/** The governing combination of one extreme of one key. */
export type CaseExtreme = { value: number; name: string; factors: Record<string, number> };

/** Combined results and the envelope per key. */
export type CombineCasesResult = {
  /**
   * Each combination with every case at its full factor (custom sets as
   * entered), and the combined value per key.
   */
  combinations: { name: string; source: string; factors: Record<string, number>; values: Record<string, number> }[];
  /** Per key the maximum and minimum over all combinations, relieving variable actions left out. */
  envelope: Record<string, { max: CaseExtreme; min: CaseExtreme }>;
  steps: Step[];
};

const schema = z.object({
  standard: standardSchema.optional(),
  factorSets: z.array(z.object({ name: z.string().min(1), factors: z.record(z.string(), z.number()) })).min(1).optional(),
  cases: z.array(z.object({ id: z.string().min(1), kind: z.string().min(1), psi0: z.number().min(0).max(1).optional() })).min(1),
  results: z.record(z.string(), z.record(z.string(), z.number())),
  units: z.string().optional(),
});

/** Applies load combinations to per-case results by superposition and finds the governing combination per key. */
export function combineCases(options: CombineCasesOptions): CombineCasesResult {
  const o = parseInput(schema, options);
  if ((o.standard === undefined) === (o.factorSets === undefined)) {
    throw new SolveError("INVALID", "standard: give either a standard or factorSets, not both or neither", { path: "standard" });
  }
  checkActions(o.standard ?? null, o.cases, "cases");
  const order = o.cases.map((c) => c.id);
  const keys = resultKeys(order, o.results);
  const unit = o.units ?? "";

  let rules: FactorRule[];
  const steps: Step[] = [];
  if (o.standard) {
    const set = standardRules(o.standard, o.cases.map((c) => ({ ...c, value: 0 })));
    rules = set.rules;
    steps.push(...headerSteps(set, o.cases.map((c) => ({ ...c, value: 0 }))));
  } else {
    rules = customRules(o.factorSets ?? [], order);
    steps.push({ latex: texText("Custom load combinations, factors as entered"), text: "Custom factor sets applied as entered." });
  }

  const full = new Map<string, { name: string; source: string; factors: Record<string, number> }>();
  for (const r of rules) {
    const factors = Object.fromEntries(order.map((id) => [id, r.factors[id].unfavourable]));
    const key = factorSignature(factors);
    if (!full.has(key)) full.set(key, { name: o.factorSets ? r.label : combinationName(r.label, factors, order), source: r.source, factors });
  }
  const combinations = [...full.values()].map((c) => ({
    ...c,
    values: Object.fromEntries(keys.map((k) => [k, order.reduce((s, id) => s + c.factors[id] * o.results[id][k], 0) + 0])),
  }));

  const envelope: CombineCasesResult["envelope"] = {};
  for (const k of keys) {
    const values = Object.fromEntries(order.map((id) => [id, o.results[id][k]]));
    const all = o.factorSets
      ? combinations.map((c) => ({ name: c.name, factors: c.factors, value: c.values[k] }))
      : envelopeCombinations(rules, values, order);
    const { max, min } = pickExtremes(all);
    envelope[k] = { max: { value: max.value, name: max.name, factors: max.factors }, min: { value: min.value, name: min.name, factors: min.factors } };
    steps.push({
      latex: `\\mathrm{${escapeTex(k)}}:\\ \\max = ${texQty(max.value, unit)}\\ ${texText(max.name)},\\quad \\min = ${texQty(min.value, unit)}\\ ${texText(min.name)}`,
      text: `${k}: maximum by ${max.name}, minimum by ${min.name}.`,
    });
  }
  return { combinations, envelope, steps };
}

/** The keys of the first case; every case must give exactly these. */
function resultKeys(order: string[], results: Record<string, Record<string, number>>): string[] {
  for (const id of order) {
    if (!results[id]) throw new SolveError("INVALID", `results.${id}: no results for case "${id}"`, { path: `results.${id}` });
  }
  const keys = Object.keys(results[order[0]]);
  for (const id of order) {
    const own = Object.keys(results[id]);
    const missing = keys.find((k) => !(k in results[id]));
    const extra = own.find((k) => !keys.includes(k));
    if (missing !== undefined) throw new SolveError("INVALID", `results.${id}.${missing}: missing (case ${order[0]} has it)`, { path: `results.${id}.${missing}` });
    if (extra !== undefined) throw new SolveError("INVALID", `results.${id}.${extra}: not in case ${order[0]}`, { path: `results.${id}.${extra}` });
  }
  return keys;
}

/** Custom sets as rules whose two factors are equal, so the envelope applies them as entered. */
function customRules(sets: CustomFactorSet[], order: string[]): FactorRule[] {
  const names = new Set<string>();
  return sets.map((set, i) => {
    if (names.has(set.name)) throw new SolveError("INVALID", `factorSets[${i}].name: "${set.name}" is used twice`, { path: `factorSets[${i}].name` });
    names.add(set.name);
    for (const id of Object.keys(set.factors)) {
      if (!order.includes(id)) {
        throw new SolveError("INVALID", `factorSets[${i}].factors.${id}: no case "${id}"`, { path: `factorSets[${i}].factors.${id}` });
      }
    }
    const factors = Object.fromEntries(order.map((id) => [id, { unfavourable: set.factors[id] ?? 0, favourable: set.factors[id] ?? 0 }]));
    return { label: set.name, source: "custom factor set", factors };
  });
}
