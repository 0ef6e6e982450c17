import type { Step } from "../types";

/** A number with its unit, as exchanged between calcs. `unit` is "" for a plain number. */
export type Quantity = {
  /** The value expressed in `unit` (never NaN or Infinity). */
  value: number;
  /** A unit string mathjs can read, e.g. `kN*m`, `kN/m`, `mm^2`, `deg`; "" for a plain number. */
  unit: string;
};

/** Which engineering units results are shown in when a line gives no `-> unit`. */
export type UnitSystem = "SI" | "US";

/** Input of {@link evaluateFormulas}. */
export type EvaluateFormulasOptions = {
  /** The calc's text: one `name = expression` per line, `#` comments, optional `-> unit`. */
  source: string;
  /**
   * Values the lines may read besides their own: exports of other calcs under dotted names
   * (`T1.F_U1L2`) or plain names. A line may not redefine one of these.
   */
  scope?: Record<string, Quantity>;
  /** Engineering units for results without `-> unit`; default "SI". */
  preferredUnits?: UnitSystem;
};

/** A problem reported on one line; the other lines still evaluate. */
export type FormulaError = {
  /** 1-based line number in `source`. */
  line: number;
  /** What is wrong, in words an engineer can act on. */
  message: string;
};

/** A line that evaluated. */
export type FormulaLineValue = {
  /** 1-based line number in `source`. */
  line: number;
  /** The name assigned on the line, e.g. `M_max`. */
  name: string;
  /** The comment written after `#` on the line, if any. */
  note?: string;
  /** The right-hand side with symbols, as LaTeX. */
  expressionLatex: string;
  /** The right-hand side with every variable replaced by its value and unit, as LaTeX. */
  substitutedLatex: string;
  /** The result with its unit, as LaTeX. */
  resultLatex: string;
  /** The result in `unit`, unrounded (float noise beyond 15 significant digits removed). */
  value: number;
  /** The unit the result is shown in ("" for a plain number). */
  unit: string;
  /** The result for plain-text places (tables, tooltips): rounded, e.g. `54 kN·m`. */
  display: string;
  /** `symbol = expression = numbers = result`, duplicates collapsed. */
  step: Step;
  error?: undefined;
};

/** A line that could not be evaluated; `error` says why. */
export type FormulaLineFailure = {
  line: number;
  /** The name the line tried to assign ("" when the line has none). */
  name: string;
  note?: string;
  /** The right-hand side as LaTeX, when it could be read. */
  expressionLatex?: string;
  error: FormulaError;
  value?: undefined;
};

/** One assignment line of the source; narrow with `if (line.error)`. */
export type FormulaLineResult = FormulaLineValue | FormulaLineFailure;

/** A line holding only a comment, shown as a note between the formulas. */
export type FormulaNote = { line: number; text: string };

/** Output of {@link evaluateFormulas}. */
export type FormulaResult = {
  /** Every assignment line, in source order. */
  lines: FormulaLineResult[];
  /** Comment-only lines. */
  notes: FormulaNote[];
  /** One step per line that evaluated, in source order. */
  steps: Step[];
  /** Values other calcs may reference: name → quantity, lines that evaluated only. */
  exports: Record<string, Quantity>;
  /** Every line error, in source order (the same objects as on `lines`). */
  errors: FormulaError[];
};
