import type { CellValue, InputRow } from "./input-column";

/** The rows with one cell changed; the other rows keep their identity, so memoised rows do not re-render. */
export function setCell<Row extends InputRow>(rows: readonly Row[], rowIndex: number, key: keyof Row & string, value: CellValue): Row[] {
  return rows.map((r, i) => (i === rowIndex ? ({ ...r, [key]: value } as Row) : r));
}
