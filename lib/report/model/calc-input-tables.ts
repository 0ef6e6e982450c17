import { combinationsInputs } from "../../calcs/combinations/combinations-inputs";
import type { CombinationsView } from "../../calcs/combinations/combinations-view";
import { deflectionInputs } from "../../calcs/deflection/deflection-inputs";
import type { DeflectionView } from "../../calcs/deflection/deflection-view";
import { formulaInputs } from "../../calcs/formula/formula-inputs";
import type { FormulaView } from "../../calcs/formula/formula-view";
import { jointInputs } from "../../calcs/joint/joint-inputs";
import type { JointView } from "../../calcs/joint/joint-view";
import { memberDesignInputs } from "../../calcs/member-design/member-design-inputs";
import type { MemberDesignView } from "../../calcs/member-design/member-design-view";
import { sectionCutInputs } from "../../calcs/section-cut/section-cut-inputs";
import type { SectionCutView } from "../../calcs/section-cut/section-cut-view";
import { trussInputs } from "../../calcs/truss/truss-inputs";
import type { TrussView } from "../../calcs/truss/truss-view";
import type { CalcNode, CalcResult } from "../../calcs/calc-types";
import type { ReportTable } from "../report-model";
import { combinationsTables, formulaTables, memberDesignTables } from "./design-calc-tables";
import { deflectionTables, jointTables, sectionCutTables } from "./linked-calc-tables";
import { trussInputTables } from "./truss-tables";

/**
 * A calc's inputs, and what it derives beside them, as tables. Inputs are
 * parsed with the kind's own schema (defaults filled); derived tables come
 * from the view only when the calc computed. Inputs that do not parse give
 * one table of the field problems instead.
 */
export function calcInputTables(calc: CalcNode, result: CalcResult | undefined): ReportTable[] {
  const view = result?.status === "ok" ? result.view : null;
  const tables = tablesOf(calc, result, view);
  if (tables) return tables;
  const problems = result?.fieldErrors ?? [];
  return [{ caption: "Inputs (not valid)", header: ["Field", "Problem"], rows: problems.length ? problems.map((p) => [p.path || "inputs", p.message]) : [["inputs", "could not be read"]], align: ["left", "left"] }];
}

function tablesOf(calc: CalcNode, result: CalcResult | undefined, view: unknown): ReportTable[] | null {
  switch (calc.kind) {
    case "truss": {
      const p = trussInputs.safeParse(calc.inputs);
      // The truss's stability line is useful even when it did not solve (an unstable truss says which joints move).
      return p.success ? trussInputTables(p.data, (result?.view as TrussView | undefined) ?? null) : null;
    }
    case "sectionCut": {
      const p = sectionCutInputs.safeParse(calc.inputs);
      return p.success ? sectionCutTables(p.data, view as SectionCutView | null) : null;
    }
    case "joint": {
      const p = jointInputs.safeParse(calc.inputs);
      return p.success ? jointTables(p.data, view as JointView | null) : null;
    }
    case "formula": {
      const p = formulaInputs.safeParse(calc.inputs);
      return p.success ? formulaTables(p.data, (result?.view as FormulaView | undefined) ?? null) : null;
    }
    case "combinations": {
      const p = combinationsInputs.safeParse(calc.inputs);
      return p.success ? combinationsTables(p.data, view as CombinationsView | null) : null;
    }
    case "memberDesign": {
      const p = memberDesignInputs.safeParse(calc.inputs);
      return p.success ? memberDesignTables(p.data, view as MemberDesignView | null) : null;
    }
    case "deflection": {
      const p = deflectionInputs.safeParse(calc.inputs);
      return p.success ? deflectionTables(p.data, view as DeflectionView | null) : null;
    }
  }
}
