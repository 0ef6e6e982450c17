import { SolveError } from "../errors";
import type { Step } from "../types";
import { evaluateFormulaLine } from "./evaluate-formula-line";
import type { EvaluateFormulasOptions, FormulaError, FormulaLineResult, FormulaNote, FormulaResult, Quantity } from "./formula-types";
import type { Measure } from "./measure";
import { normalizeUnit } from "./normalize-unit";
import { toSafeName } from "./safe-name";
import { splitFormulaLine } from "./split-formula-line";
import { unitInfo } from "./unit-info";
import { validateFormulaOptions } from "./validate-formula-options";

/**
 * Evaluates a Formula calc: lines of `name = expression`, top to bottom, each
 * seeing the lines above it and the `scope` (other calcs' exports). A line
 * with a problem reports it and the lines after it still evaluate; lines that
 * read its name report that they depend on it. Pure: same input, same output.
 */
export function evaluateFormulas(options: EvaluateFormulasOptions): FormulaResult {
  const { lines: texts, system, scope } = validateFormulaOptions(options);
  const values = new Map<string, Measure>();
  const shown = new Map<string, Quantity>();
  const failed = new Map<string, number>();
  // Where each name was given: its line, or 0 for the scope. A name is assigned once.
  const claimed = new Map<string, number>();

  for (const [name, q] of scope) {
    const unit = normalizeUnit(q.unit);
    const found = unitInfo(unit);
    if (!found.ok) throw new SolveError("INVALID", found.message, { path: `scope.${name}.unit` });
    const safe = toSafeName(name);
    values.set(safe, { si: q.value * found.info.factor, dims: found.info.dims, hint: unit });
    shown.set(safe, { value: q.value, unit });
    claimed.set(safe, 0);
  }

  const lines: FormulaLineResult[] = [];
  const notes: FormulaNote[] = [];
  const steps: Step[] = [];
  const errors: FormulaError[] = [];
  const exports: Record<string, Quantity> = {};
  const fail = (result: FormulaLineResult & { error: FormulaError }) => {
    lines.push(result);
    errors.push(result.error);
  };

  texts.forEach((text, index) => {
    const line = index + 1;
    const split = splitFormulaLine(text);
    if (split.kind === "blank") return;
    if (split.kind === "note") {
      notes.push({ line, text: split.text });
      return;
    }
    const note = split.note !== undefined ? { note: split.note } : {};
    const before = split.name ? claimed.get(split.name) : undefined;
    if (before !== undefined) {
      const message =
        before === 0
          ? `${split.name} is a value of another calc and cannot be redefined on line ${line}`
          : `${split.name} is defined twice (lines ${before} and ${line})`;
      fail({ line, name: split.name, ...note, error: { line, message } });
      return;
    }
    if (split.kind === "malformed") {
      if (split.named) {
        claimed.set(split.name, line);
        failed.set(split.name, line);
      }
      fail({ line, name: split.name, ...note, error: { line, message: `${split.message} on line ${line}` } });
      return;
    }
    claimed.set(split.name, line);
    const outcome = evaluateFormulaLine({ line, ...split }, { values, shown, failed, system });
    if (!outcome.ok) {
      failed.set(split.name, line);
      fail(outcome.result);
      return;
    }
    const { result } = outcome;
    values.set(split.name, outcome.measure);
    shown.set(split.name, { value: result.value, unit: result.unit });
    exports[split.name] = { value: result.value, unit: result.unit };
    lines.push(result);
    steps.push(result.step);
  });

  return { lines, notes, steps, exports, errors };
}
