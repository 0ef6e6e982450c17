/** What a cell holds: text, a number, or nothing yet (a cleared number cell). */
export type CellValue = string | number | undefined;

/**
 * A row of an input table. Declare row types with `type` (not `interface`) so
 * they fit this index signature; number fields should be optional, because a
 * cleared number cell is `undefined` until the engineer types a value again.
 */
export type InputRow = Record<string, CellValue>;

export type SelectOption = { value: string; label: string };

export type InputColumn<Row extends InputRow = InputRow> = {
  key: keyof Row & string;
  /** Header text, e.g. "x"; the unit is shown after it: "x (m)". */
  label: string;
  unit?: string;
  kind: "text" | "number" | "select";
  /** For `select`: plain values, or values with their own labels. */
  options?: readonly (string | SelectOption)[];
  /** CSS width of the column, e.g. "6rem" or 96 (pixels). */
  width?: string | number;
  /** A row without a value here is skipped on CSV import (e.g. the label). */
  required?: boolean;
  /** Other header names a CSV file may use for this column, e.g. "label" or "name" for `id`. */
  aliases?: readonly string[];
};

/** A select column's options as value/label pairs. */
export function optionsOf(column: Pick<InputColumn, "options">): SelectOption[] {
  return (column.options ?? []).map((o) => (typeof o === "string" ? { value: o, label: o } : o));
}
