import { evaluateFormulas, type Quantity } from "../../solve";
import type { CalcValue } from "../calc-types";
import { errorEvaluation } from "../error-evaluation";
import { computedEvaluation, failedEvaluation, type KindEvaluation } from "../kind-evaluation";
import { quantityValue } from "../quantity-value";
import type { FormulaInputs } from "./formula-inputs";
import type { FormulaView } from "./formula-view";

/**
 * Field path of a problem on one line of a formula: `source:line<n>`, n from
 * 1, so the editor can underline that line of the source field.
 */
export function formulaLinePath(line: number): string {
  return `source:line${line}`;
}

/**
 * Evaluates the lines with the referenced quantities in scope (a whole truss
 * cannot stand in an expression and is left out). Every line that assigns a
 * value exports it under its name. A line with a problem is a field error on
 * `source:line<n>`; the other lines still show their results.
 */
export function evaluateFormula(inputs: FormulaInputs, resolved: Record<string, CalcValue>): KindEvaluation<FormulaView> {
  const scope: Record<string, Quantity> = {};
  for (const [name, value] of Object.entries(resolved)) if (value.type === "quantity") scope[name] = { value: value.value, unit: value.unit };
  let result;
  try {
    result = evaluateFormulas({ source: inputs.source, scope, preferredUnits: inputs.preferredUnits });
  } catch (e) {
    return errorEvaluation(e, { fields: ["source", "preferredUnits"] });
  }
  const view: FormulaView = {
    lines: result.lines.map((l) =>
      l.error
        ? { line: l.line, name: l.name, ...(l.note === undefined ? {} : { note: l.note }), error: l.error.message }
        : { line: l.line, name: l.name, ...(l.note === undefined ? {} : { note: l.note }), latex: l.step.latex, value: l.value, unit: l.unit, display: l.display },
    ),
    notes: result.notes,
  };
  if (result.errors.length > 0) {
    return { ...failedEvaluation({ fieldErrors: result.errors.map((e) => ({ path: formulaLinePath(e.line), message: e.message })), view }), steps: result.steps };
  }
  const exports = Object.fromEntries(Object.entries(result.exports).map(([name, q]) => [name, quantityValue(q.value, q.unit)]));
  return computedEvaluation({ exports, steps: result.steps, view });
}
