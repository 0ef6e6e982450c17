import type { ReportTable } from "../lib/report/report-model";

/** A left-aligned table of text, with one row saying `empty` when there are none. */
export function reportTableFrom(header: string[], rows: string[][], empty: string, caption: string | null = null): ReportTable {
  return { caption, header, rows: rows.length ? rows : [[empty, ...header.slice(1).map(() => "")]], align: header.map(() => "left" as const) };
}
