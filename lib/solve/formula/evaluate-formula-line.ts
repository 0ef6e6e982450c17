import { texQty } from "../latex";
import { astToTex } from "./ast-to-tex";
import { chooseDisplayUnit } from "./choose-display-unit";
import { evaluateAst } from "./evaluate-ast";
import { formatPlainNumber } from "./format-plain-number";
import { FormulaProblem } from "./formula-problem";
import type { FormulaLineFailure, FormulaLineValue, Quantity, UnitSystem } from "./formula-types";
import type { Measure } from "./measure";
import { parseExpression } from "./parse-expression";
import { texName } from "./tex-name";
import { toFormulaAst } from "./to-formula-ast";

/** What a line can see: values bound so far (by safe name), how they are shown, and names whose lines failed. */
export type LineScope = {
  values: ReadonlyMap<string, Measure>;
  shown: ReadonlyMap<string, Quantity>;
  failed: ReadonlyMap<string, number>;
  system: UnitSystem;
};

/** One `name = expression -> unit` line, already split. */
export type FormulaLineInput = { line: number; name: string; expression: string; target?: string; note?: string };

/** A line's outcome; on success also the value to bind its name to. */
export type LineOutcome = { ok: true; result: FormulaLineValue; measure: Measure } | { ok: false; result: FormulaLineFailure };

/** Evaluates one line against what earlier lines and the scope defined; never throws for the author's mistakes. */
export function evaluateFormulaLine(input: FormulaLineInput, scope: LineScope): LineOutcome {
  const { line, name, note } = input;
  let expressionLatex: string | undefined;
  try {
    const parsed = parseExpression(input.expression);
    if (!parsed.ok) throw new FormulaProblem(parsed.message);
    const ast = toFormulaAst(parsed.node, {
      isVariable: (n) => scope.values.has(n),
      failedLine: (n) => scope.failed.get(n),
    });
    expressionLatex = astToTex(ast, { kind: "symbols" });
    const measure = evaluateAst(ast, scope);
    const choice = chooseDisplayUnit(measure, scope.system, input.target);
    if (!choice.ok) throw new FormulaProblem(choice.message);
    const { value, unit } = choice;
    const substitutedLatex = astToTex(ast, { kind: "numbers", shown: (n) => scope.shown.get(n) });
    const resultLatex = texQty(value, unit);
    const display = unit ? `${formatPlainNumber(value)} ${unit.replaceAll("*", "·")}` : formatPlainNumber(value);
    const latex = distinct([texName(name), expressionLatex, substitutedLatex, resultLatex]).join(" = ");
    const words = distinct([name, input.expression, display]).join(" = ");
    const result: FormulaLineValue = {
      line, name, ...(note !== undefined && { note }),
      expressionLatex, substitutedLatex, resultLatex, value, unit, display,
      step: { latex, text: note !== undefined ? `${words} (${note})` : words },
    };
    return { ok: true, result, measure: { si: measure.si, dims: measure.dims, hint: unit } };
  } catch (e) {
    if (!(e instanceof FormulaProblem)) throw e;
    const message = e.dependsOn !== undefined ? e.message : `${e.message} on line ${line}`;
    const result: FormulaLineFailure = {
      line, name, ...(note !== undefined && { note }), ...(expressionLatex !== undefined && { expressionLatex }),
      error: { line, message },
    };
    return { ok: false, result };
  }
}

/** Drops a part equal to the one before it (`w = 12 kN/m` needs no `= 12 kN/m = 12 kN/m`). */
function distinct(parts: string[]): string[] {
  return parts.filter((p, i) => i === 0 || p !== parts[i - 1]);
}
