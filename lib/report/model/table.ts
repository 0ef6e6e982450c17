import type { ReportTable } from "../report-model";

/** A table; columns whose every cell looks numeric are right-aligned. */
export function table(caption: string | null, header: string[], rows: string[][]): ReportTable {
  const numeric = /^[\u2212\-+]?[\d.,]+(\s?\S{0,6})?$|^—$/;
  const align = header.map((_, i) => (rows.length > 0 && rows.every((r) => numeric.test(r[i] ?? "")) ? ("right" as const) : ("left" as const)));
  return { caption, header, rows, align };
}

/** A two-column parameter table. */
export function parameters(caption: string, entries: [string, string | null | undefined][]): ReportTable {
  return { caption, header: ["Parameter", "Value"], rows: entries.filter(([, v]) => v !== null && v !== undefined && v !== "").map(([k, v]) => [k, v as string]), align: ["left", "left"] };
}
