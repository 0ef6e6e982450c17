import { listFormulaReferences } from "../../solve";
import type { FormulaInputs } from "./formula-inputs";

// Parsed inputs keep their identity between recomputes, so the lines are read once per edit.
const cache = new WeakMap<FormulaInputs, string[]>();

/** The other calcs' values the formula lines read (`T1.F_U1L2_G`), in order of first use. */
export function formulaReferences(inputs: FormulaInputs): string[] {
  const known = cache.get(inputs);
  if (known) return known;
  const found = listFormulaReferences(inputs.source);
  cache.set(inputs, found);
  return found;
}
