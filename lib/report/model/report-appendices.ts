import type { CalcNode, CalcResult, TrussValue } from "../../calcs/calc-types";
import type { TrussView } from "../../calcs/truss/truss-view";
import type { ReportAppendix, ReportTable } from "../report-model";
import { fixed, senseMark } from "./format-quantity";
import { table } from "./table";
import { trussCaseTables } from "./truss-tables";

/** Full member-force tables: every case of each truss, every combination of each Combinations calc. */
export function reportAppendices(calcs: CalcNode[], results: Record<string, CalcResult>): ReportAppendix[] {
  const out: ReportAppendix[] = [];
  for (const calc of calcs) {
    const r = results[calc.id];
    if (r?.status !== "ok") continue;
    if (calc.kind === "truss") {
      out.push({ title: `Member forces of ${calc.label}, by load case`, calcLabel: calc.label, tables: trussCaseTables(r.view as TrussView, calc.label) });
    }
    if (calc.kind === "combinations") {
      const value = r.exports.model as TrussValue | undefined;
      if (value?.type === "truss") out.push({ title: `Member forces of ${calc.label}, by combination`, calcLabel: calc.label, tables: combinationTables(value, calc.label) });
    }
  }
  return out;
}

function combinationTables(value: TrussValue, label: string): ReportTable[] {
  const force = value.model.units?.force ?? "kN";
  return value.combinations.flatMap((name) => {
    const c = value.solution.cases[name];
    if (!c) return [];
    const scale = Math.max(0, ...Object.values(c.forces).map(Math.abs));
    const sense = (f: number) => senseMark(Math.abs(f) <= scale * 1e-9 ? "zero" : f > 0 ? "tension" : "compression");
    return [
      table(`${label}, ${name}: member forces (tension positive)`, ["Member", `N (${force})`, "Sense"], Object.entries(c.forces).map(([m, f]) => [m, fixed(f, 2), sense(f)])),
      table(`${label}, ${name}: reactions`, ["Joint", `Rx (${force})`, `Ry (${force})`], Object.entries(c.reactions).map(([j, rr]) => [j, fixed(rr.rx, 2), fixed(rr.ry, 2)])),
    ];
  });
}
