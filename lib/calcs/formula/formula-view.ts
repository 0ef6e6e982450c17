/** One line of a Formula calc as shown: its result, or the problem on it. */
export type FormulaLineView = {
  /** 1-based line number in the source. */
  line: number;
  name: string;
  note?: string;
  /** `symbol = expression = numbers = result`, typeset; absent when the line has a problem. */
  latex?: string;
  value?: number;
  unit?: string;
  /** Rounded result for tables, e.g. "54 kN·m". */
  display?: string;
  error?: string;
};

/** What the Formula calc shows. */
export type FormulaView = {
  lines: FormulaLineView[];
  /** Comment-only lines, shown between the formulas. */
  notes: { line: number; text: string }[];
};
