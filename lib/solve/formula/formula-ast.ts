import type { FormulaFunction } from "./reserved-names";

/**
 * A line's right-hand side after every name has been classified: variables,
 * numbers with their units, and the operations of the syntax, nothing else.
 * Evaluation and typesetting both work on this tree, never on raw mathjs nodes.
 */
export type FormulaAst =
  | { kind: "number"; value: number }
  /** A number written with its unit, `12 kN/m`; `unit` is normalized (`kN/m`, `kN*m`). */
  | { kind: "quantity"; value: number; unit: string }
  /** A name bound by an earlier line or the scope (safe form: `T1$F`). */
  | { kind: "variable"; name: string }
  | { kind: "pi" }
  | { kind: "binary"; op: "+" | "-" | "*" | "/" | "^"; left: FormulaAst; right: FormulaAst }
  | { kind: "negate"; operand: FormulaAst }
  /** Parentheses the author wrote. */
  | { kind: "group"; content: FormulaAst }
  | { kind: "call"; fn: FormulaFunction; args: FormulaAst[] };
