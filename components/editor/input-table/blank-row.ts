import { optionsOf, type InputColumn, type InputRow } from "./input-column";

/** A new row: empty text, no numbers, and the first option of each select. */
export function blankRow<Row extends InputRow>(columns: readonly InputColumn<Row>[]): Row {
  const row: InputRow = {};
  for (const c of columns) {
    row[c.key] = c.kind === "text" ? "" : c.kind === "select" ? optionsOf(c)[0]?.value : undefined;
  }
  // The keys are exactly the columns' keys, each with a value of its column's kind.
  return row as Row;
}
