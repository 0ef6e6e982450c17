export { evaluateFormulas } from "./evaluate-formulas";
export { listFormulaReferences } from "./list-formula-references";
export { ENGINEERING_UNITS } from "./engineering-units";
export type {
  EvaluateFormulasOptions,
  FormulaError,
  FormulaLineFailure,
  FormulaLineResult,
  FormulaLineValue,
  FormulaNote,
  FormulaResult,
  Quantity,
  UnitSystem,
} from "./formula-types";
