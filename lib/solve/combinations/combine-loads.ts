import { z } from "zod";
import { parseInput } from "../design/parse-input";
import type { Step } from "../types";
import { actionSchema, checkActions, standardSchema } from "./action-schema";
import { combinationStep, extremeSteps, headerSteps } from "./combination-steps";
import { envelopeCombinations } from "./envelope-combinations";
import { pickExtremes } from "./pick-extremes";
import { standardRules } from "./standard-rules";
import type { CombineLoadsOptions, CombineLoadsResult } from "./types";

const schema = z.object({
  standard: standardSchema,
  actions: z.array(actionSchema).min(1),
  units: z.string().optional(),
});

/**
 * Combines scalar load effects by a published set (ASCE/SEI 7-16 or 7-22
 * LRFD, 7-16 ASD, EN 1990 Eq. 6.10 or 6.10a/b) and returns every combination
 * with the largest and smallest. Each combination appears in a maximum and a
 * minimum form: variable actions are left out where they relieve, permanent
 * actions take their favourable factor where that governs.
 */
export function combineLoads(options: CombineLoadsOptions): CombineLoadsResult {
  const { standard, actions, units } = parseInput(schema, options);
  checkActions(standard, actions, "actions");
  const unit = units ?? "";
  const set = standardRules(standard, actions);
  const order = actions.map((a) => a.id);
  const values = Object.fromEntries(actions.map((a) => [a.id, a.value]));
  const combinations = envelopeCombinations(set.rules, values, order);
  const { max, min } = pickExtremes(combinations);
  const steps: Step[] = [
    ...headerSteps(set, actions),
    ...combinations.map((c) => combinationStep(c, values, order, unit)),
    ...extremeSteps(max, min, unit),
  ];
  return {
    combinations,
    max: { value: max.value, name: max.name },
    min: { value: min.value, name: min.name },
    steps,
  };
}
