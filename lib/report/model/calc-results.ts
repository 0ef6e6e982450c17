import { texSymbol } from "../../solve";
import type { CalcNode, CalcResult, CalcValue } from "../../calcs/calc-types";
import type { ReportCalc } from "../report-model";
import { printUnit, sig } from "./format-quantity";

type Quantity = Extract<CalcValue, { type: "quantity" }>;
const MAX_ROWS = 16;

/**
 * The values a calc exports, formatted. Kinds that export one value per
 * member (Truss, Combinations) would fill pages with them; for those the
 * governing values are chosen (reactions, extremes) and the full tables go
 * to the appendix.
 */
export function calcResults(calc: CalcNode, result: CalcResult | undefined): ReportCalc["results"] {
  if (!result || result.status !== "ok") return [];
  let entries = Object.entries(result.exports).filter((e): e is [string, Quantity] => e[1].type === "quantity");
  if (calc.kind === "truss") entries = entries.filter(([name]) => name.startsWith("R_")).filter(([, q]) => q.value !== 0);
  if (calc.kind === "combinations") entries = extremes(entries);
  return entries.slice(0, calc.kind === "memberDesign" || calc.kind === "formula" ? undefined : MAX_ROWS).map(([name, q]) => ({
    name,
    tex: texSymbol(name),
    value: sig(q.value, 4),
    unit: printUnit(q.unit),
  }));
}

/** The largest tension and the largest compression over every member and combination, and the reactions' maxima. */
function extremes(entries: [string, Quantity][]): [string, Quantity][] {
  const forces = entries.filter(([n]) => n.startsWith("N_"));
  const byValue = [...forces].sort((a, b) => a[1].value - b[1].value);
  const picked: [string, Quantity][] = [];
  if (byValue.length) picked.push(byValue[byValue.length - 1], byValue[0]);
  picked.push(...entries.filter(([n, q]) => n.startsWith("R_") && n.endsWith("_max") && q.value !== 0));
  return picked;
}
