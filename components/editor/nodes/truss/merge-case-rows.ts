import type { LoadCaseDraft } from "./truss-draft";

/** A load case as a row of the cases table; its loads live in a table of their own. */
export type CaseRow = { id: string; kind: string };

/**
 * Load cases after the cases table changed. The table hands back rows, not
 * cases, so each case's loads are matched to its row: a removed row is found
 * where the unchanged rows (kept by identity) stop lining up, and every other
 * change (an edit, a paste, a new row at the end) keeps rows in place.
 */
export function mergeCaseRows(cases: readonly LoadCaseDraft[], before: readonly CaseRow[], after: readonly CaseRow[]): LoadCaseDraft[] {
  let removed = -1;
  if (after.length === before.length - 1) {
    removed = before.findIndex((row, i) => after[i] !== row);
    if (removed === -1) removed = before.length - 1;
  }
  return after.map((row, i) => {
    const source = removed !== -1 && i >= removed ? cases[i + 1] : cases[i];
    return { id: row.id, kind: row.kind, loads: source?.loads ?? [] };
  });
}
