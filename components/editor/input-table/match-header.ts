import type { InputColumn, InputRow } from "./input-column";

export type HeaderMatch<Row extends InputRow> = {
  column: InputColumn<Row>;
  /** The unit the header states, e.g. "ft" from "x (ft)" or "x [ft]". */
  unit?: string;
};

/**
 * The column a CSV header names: by key, label or alias, ignoring case, spaces,
 * underscores and a trailing unit in parentheses or brackets.
 */
export function matchHeader<Row extends InputRow>(columns: readonly InputColumn<Row>[], header: string): HeaderMatch<Row> | undefined {
  const m = /^(.*?)\s*[([]\s*([^)\]]*?)\s*[)\]]\s*$/.exec(header.trim());
  const name = normalizeName(m ? m[1] : header);
  const unit = m && m[2] !== "" ? m[2] : undefined;
  if (name === "") return undefined;
  const column = columns.find((c) => [c.key, c.label, ...(c.aliases ?? [])].some((n) => normalizeName(n) === name));
  return column ? { column, unit } : undefined;
}

function normalizeName(s: string): string {
  return s.trim().toLowerCase().replace(/[\s_-]+/g, " ");
}

/**
 * Whether two unit spellings mean the same unit: "kN" and "KN", "mm²", "mm2"
 * and "mm^2". Case is ignored because files get it wrong; no two units in
 * engineering use differ only by case except m and M (mega), never a unit alone.
 */
export function sameUnit(a: string, b: string): boolean {
  const n = (u: string) => u.trim().toLowerCase().replace(/\s+/g, "").replace(/²/g, "2").replace(/³/g, "3").replace(/\^/g, "");
  return n(a) === n(b);
}
