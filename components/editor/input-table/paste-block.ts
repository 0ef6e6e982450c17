import type { CellPosition } from "./move-focus";
import type { InputColumn, InputRow } from "./input-column";
import { matchHeader } from "./match-header";
import { parseCell } from "./parse-cell";
import { parseCsv } from "./parse-csv";
import { setCell } from "./set-cell";

export type PasteProblem = { row: number; key: string; text: string; message: string };

export type PasteResult<Row extends InputRow> = {
  rows: Row[];
  /** Cells left as they were because the pasted text did not fit the column. */
  problems: PasteProblem[];
  /** Values that fell beyond the last column and were not pasted. */
  clipped: number;
  /** The block's first line named the columns and was left out. */
  headerSkipped: boolean;
};

export type PasteBlockOptions<Row extends InputRow> = {
  rows: readonly Row[];
  columns: readonly InputColumn<Row>[];
  /** The cell the paste lands in: the block's top-left corner. */
  at: CellPosition;
  text: string;
  newRow: () => Row;
};

/**
 * A block copied from a spreadsheet (tab-separated lines) pasted into the grid
 * from `at`, adding rows as needed. Returns null for a single value, which the
 * cell's own paste handles. A blank pasted cell clears its target, as a
 * spreadsheet does; a value that does not fit its column leaves the cell as it
 * was and is reported.
 */
export function pasteBlock<Row extends InputRow>({ rows, columns, at, text, newRow }: PasteBlockOptions<Row>): PasteResult<Row> | null {
  if (!/[\t\n\r]/.test(text.replace(/(\r?\n)+$/, ""))) return null;
  let block = parseCsv(text, { delimiter: "\t" }).records.map((r) => r.fields);
  if (block.length === 0) return null;

  const target = (j: number) => columns[at.col + j];
  const headerSkipped = block.length > 1 && block[0].every((t, j) => t.trim() === "" || (target(j) !== undefined && matchHeader([target(j)], t) !== undefined));
  if (headerSkipped) block = block.slice(1);

  let out = [...rows];
  const problems: PasteProblem[] = [];
  let clipped = 0;
  block.forEach((values, i) => {
    const r = at.row + i;
    while (out.length <= r) out = [...out, newRow()];
    values.forEach((t, j) => {
      const column = target(j);
      if (!column) {
        if (t.trim() !== "") clipped++;
        return;
      }
      const parsed = parseCell(column, t);
      if (parsed.ok) out = setCell(out, r, column.key, parsed.value);
      else problems.push({ row: r, key: column.key, text: t, message: parsed.message });
    });
  });
  return { rows: out, problems, clipped, headerSkipped };
}
