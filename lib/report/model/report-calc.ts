import { calcKindNames } from "../../calcs/calc-kind-names";
import type { CalcNode, CalcResult, TrussValue } from "../../calcs/calc-types";
import type { ReportCalc } from "../report-model";
import { calcDiagramSvg } from "./calc-diagram";
import { calcInputTables } from "./calc-input-tables";
import { calcResults } from "./calc-results";

/** One calc as the report prints it: inputs, diagram, steps, governing results and messages. */
export function reportCalc(calc: CalcNode, result: CalcResult | undefined, options: { revised: boolean; trussOf: (label: string) => TrussValue | null }): ReportCalc {
  const kindName = calcKindNames[calc.kind] ?? calc.kind;
  const messages = [...(result?.messages ?? [])];
  for (const e of result?.fieldErrors ?? []) messages.push(`${e.path ? `${e.path}: ` : ""}${e.message}`);
  if (!result) messages.push("This calc was not evaluated.");
  return {
    id: calc.id,
    label: calc.label,
    kind: calc.kind,
    kindName,
    title: titleOf(calc) ?? kindName,
    status: result?.status ?? "error",
    inputs: calcInputTables(calc, result),
    diagramSvg: calcDiagramSvg(calc, result, options.trussOf),
    steps: result?.steps ?? [],
    results: calcResults(calc, result),
    messages,
    revised: options.revised,
  };
}

/** A calc's own title: a formula's first comment line, when it starts with one. */
function titleOf(calc: CalcNode): string | null {
  const inputs = calc.inputs as { title?: unknown; source?: unknown } | null;
  if (inputs && typeof inputs.title === "string" && inputs.title.trim()) return inputs.title.trim();
  if (calc.kind === "formula" && inputs && typeof inputs.source === "string") {
    const first = inputs.source.split("\n")[0]?.trim() ?? "";
    if (first.startsWith("#")) return first.replace(/^#+\s*/, "") || null;
  }
  return null;
}
