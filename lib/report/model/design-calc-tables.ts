import type { CombinationsInputs } from "../../calcs/combinations/combinations-inputs";
import type { CombinationsView } from "../../calcs/combinations/combinations-view";
import type { FormulaInputs } from "../../calcs/formula/formula-inputs";
import type { FormulaView } from "../../calcs/formula/formula-view";
import type { MemberDesignInputs } from "../../calcs/member-design/member-design-inputs";
import type { MemberDesignView } from "../../calcs/member-design/member-design-view";
import type { ReportTable } from "../report-model";
import { combinationExpression } from "./combination-expression";
import { fixed, sig } from "./format-quantity";
import { parameters, table } from "./table";

/** A Formula calc: each line with its result, or the problem on it. */
export function formulaTables(inputs: FormulaInputs, view: FormulaView | null): ReportTable[] {
  const source = inputs.source.split("\n");
  const rows = view
    ? view.lines.map((l) => [String(l.line), (source[l.line - 1] ?? "").replace(/#.*$/, "").trim(), l.error ? `Error: ${l.error}` : (l.display ?? "—"), l.note ?? ""])
    : source.map((s, i) => [String(i + 1), s, "", ""]);
  return [{ caption: `Formulas (${inputs.preferredUnits} units)`, header: ["Line", "Formula", "Result", "Note"], rows, align: ["right", "left", "right", "left"] }];
}

/** A Combinations calc: the set applied, each combination's factors, and the governing values. */
export function combinationsTables(inputs: CombinationsInputs, view: CombinationsView | null): ReportTable[] {
  const out = [parameters("Combinations", [["Truss", inputs.truss], ["Set", inputs.standard], ["Cases combined", view ? view.cases.map((c) => `${c.id} (${c.kind})`).join(", ") : null]])];
  if (!view) return out;
  out.push(table("Combinations applied", ["Combination", "Expression", "Source"], view.combinations.map((c) => [c.name, combinationExpression(c.factors), c.source])));
  const f = view.units.force;
  out.push(table("Governing member forces", ["Member", `Max (${f})`, "From", `Min (${f})`, "From"], view.members.map((m) => [m.member, fixed(m.max.value, 2), m.max.combination, fixed(m.min.value, 2), m.min.combination])));
  out.push(table("Governing reactions", ["Reaction", `Max (${f})`, "From", `Min (${f})`, "From"], view.reactions.map((r) => [`${r.joint} ${r.component}`, fixed(r.max.value, 2), r.max.combination, fixed(r.min.value, 2), r.min.combination])));
  return out;
}

const materialNames = { "steel-aisc360": "Steel, AISC 360-16", "steel-en1993": "Steel, EN 1993-1-1:2005", "timber-nds": "Timber, NDS 2018" } as const;

/** How a section reads in a table: "RHS 120×80×5", "CHS 88.9×5". */
export function describeSection(s: MemberDesignInputs["members"][number]["section"]): string {
  switch (s.shape) {
    case "rhs": return `RHS ${sig(s.h)}×${sig(s.b)}×${sig(s.t)}`;
    case "chs": return `CHS ${sig(s.D)}×${sig(s.t)}`;
    case "angle": return `L ${sig(s.d)}×${sig(s.b)}×${sig(s.t)}`;
    case "double-angle": return `2L ${sig(s.d)}×${sig(s.b)}×${sig(s.t)}, gap ${sig(s.gap)}`;
    case "channel": return `C ${sig(s.d)}×${sig(s.bf)}`;
    case "round": return `Round ⌀${sig(s.D)}`;
    case "rectangle": return `Rectangle ${sig(s.b)}×${sig(s.h)}`;
    case "timber": return `Timber ${sig(s.b)}×${sig(s.d)}${s.product ? ` ${s.product}` : ""}`;
    case "properties": return `A = ${sig(s.A)}, r = ${sig(s.rmin)}`;
  }
}

/** A Member design calc: the members and sections checked, and each check's outcome. */
export function memberDesignTables(inputs: MemberDesignInputs, view: MemberDesignView | null): ReportTable[] {
  const out = [parameters("Member design", [["Truss", inputs.truss], ["Forces from", view?.source ?? (inputs.source || "first case")], ["Material and standard", materialNames[inputs.material]], ["Working units", view ? `${view.units.design.force}, ${view.units.design.length}, ${view.units.design.stress}` : null]])];
  out.push(table("Sections", ["Member", "Section", "K", "Material"], inputs.members.map((m) => [m.member, describeSection(m.section), sig(m.K ?? 1), materialOf(m)])));
  if (view) {
    const f = view.units.force;
    out.push(table("Checks", ["Member", `N (${f})`, "Mode", `Capacity (${f})`, "Utilization", "", "Governs"], view.rows.map((r) => [r.member, fixed(r.force, 1), r.mode, fixed(r.capacity, 1), fixed(r.utilization, 3), r.pass ? "OK" : "NOT OK", r.governs])));
  }
  return out;
}

function materialOf(m: Record<string, unknown>): string {
  if (typeof m.fy === "number") return `fy ${sig(m.fy as number)}, fu ${sig(m.fu as number)}, curve ${String(m.curve)}`;
  if (typeof m.Fy === "number") return `Fy ${sig(m.Fy as number)}, Fu ${sig(m.Fu as number)}`;
  return `Fc* ${sig(m.FcStar as number)}, F't ${sig(m.FtPrime as number)}`;
}
