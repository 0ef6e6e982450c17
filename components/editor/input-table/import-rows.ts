import { blankRow } from "./blank-row";
import type { InputColumn, InputRow } from "./input-column";
import { matchHeader, sameUnit } from "./match-header";
import { parseCell } from "./parse-cell";
import { parseCsv } from "./parse-csv";

export type SkippedLine = { line: number; reason: string };

export type ImportResult<Row extends InputRow> = {
  rows: Row[];
  /** Lines of the file that were not imported, each with why. */
  skipped: SkippedLine[];
  /** Header names that match no column; their values are left out. */
  ignoredHeaders: string[];
  /** Columns the file does not have; their values come from `newRow`. */
  missingColumns: string[];
  /** Set when nothing could be imported at all; `rows` is then empty. */
  error?: string;
};

export type ImportRowsOptions<Row extends InputRow> = {
  /** Starting values for each imported row (defaults for columns the file lacks). */
  newRow?: () => Row;
};

/**
 * Rows from a CSV file whose first line names the columns. A file stating a
 * different unit from the table's (e.g. "x (ft)" into a table in m) is refused
 * as a whole: importing the numbers unconverted would scale the whole structure
 * silently. A semicolon-separated file is read with a decimal comma.
 */
export function importRows<Row extends InputRow>(columns: readonly InputColumn<Row>[], csvText: string, options: ImportRowsOptions<Row> = {}): ImportResult<Row> {
  const { records, delimiter, problems } = parseCsv(csvText);
  const fail = (error: string): ImportResult<Row> => ({ rows: [], skipped: [], ignoredHeaders: [], missingColumns: [], error });
  if (records.length === 0) return fail("The file is empty.");

  const [header, ...data] = records;
  const slots: (InputColumn<Row> | undefined)[] = [];
  const ignoredHeaders: string[] = [];
  for (const name of header.fields) {
    const match = matchHeader(columns, name);
    if (!match || slots.some((s) => s?.key === match.column.key)) {
      slots.push(undefined);
      if (name.trim() !== "") ignoredHeaders.push(name.trim());
      continue;
    }
    const { column, unit } = match;
    if (unit && column.unit && !sameUnit(unit, column.unit)) {
      return fail(`Column "${name.trim()}" is in ${unit} but this table is in ${column.unit}. Convert the file, or change the package's units, and import again.`);
    }
    slots.push(column);
  }
  if (slots.every((s) => s === undefined)) {
    return fail(`The first line must name the columns, e.g. ${columns.map((c) => c.key).join(", ")}.`);
  }
  const present = new Set(slots.flatMap((s) => (s ? [s.key] : [])));
  const absentRequired = columns.filter((c) => c.required && !present.has(c.key));
  if (absentRequired.length > 0) return fail(`The file has no column for ${absentRequired.map((c) => c.label).join(", ")}.`);

  const make = options.newRow ?? (() => blankRow(columns));
  const skipped: SkippedLine[] = problems.map((p) => ({ line: p.line, reason: p.reason }));
  const rows: Row[] = [];
  for (const rec of data) {
    if (rec.fields.every((f) => f.trim() === "")) continue;
    const extra = rec.fields.slice(slots.length).filter((f) => f.trim() !== "").length;
    const reasons: string[] = [];
    if (extra > 0) reasons.push(`${rec.fields.length} values but the first line names ${slots.length} columns`);
    const row: InputRow = { ...make() };
    slots.forEach((column, i) => {
      if (!column) return;
      const text = rec.fields[i] ?? "";
      const parsed = parseCell(column, text, { decimalComma: delimiter === ";" });
      if (!parsed.ok) reasons.push(`${column.label}: ${parsed.message}`);
      else if (column.required && (parsed.value === undefined || parsed.value === "")) reasons.push(`no value for ${column.label}`);
      else if (text.trim() !== "" || column.kind === "text") row[column.key] = parsed.value;
    });
    if (reasons.length > 0) skipped.push({ line: rec.line, reason: reasons.join("; ") });
    // The keys written are the columns' own, with values parsed for their kind.
    else rows.push(row as Row);
  }
  skipped.sort((a, b) => a.line - b.line);
  return { rows, skipped, ignoredHeaders, missingColumns: columns.filter((c) => !present.has(c.key)).map((c) => c.label), error: undefined };
}
