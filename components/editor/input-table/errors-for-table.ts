import { cellKey } from "./cell-key";

export type FieldError = { path: string; message: string };

/**
 * Picks the errors of one table out of model-wide field errors and keys them by
 * cell. `table` is the path of the row list as the engineering core writes it:
 * `members` takes `members[3].end` to `"3.end"`; `loadCases[0].loads` takes
 * `loadCases[0].loads[2].fy` to `"2.fy"`. The first message for a cell wins.
 */
export function errorsForTable(errors: readonly FieldError[], table: string): Record<string, string> {
  const out: Record<string, string> = {};
  const prefix = `${table}[`;
  for (const e of errors) {
    if (!e.path.startsWith(prefix)) continue;
    const m = /^(\d+)\]\.([A-Za-z_$][\w$]*)/.exec(e.path.slice(prefix.length));
    if (!m) continue;
    const k = cellKey(Number(m[1]), m[2]);
    if (!(k in out)) out[k] = e.message;
  }
  return out;
}
