import type { LineLoadDraft } from "./truss-draft";

/** A line load as a table row: the chord written out as joint ids separated by spaces. */
export type LineLoadRow = { case: string; chord: string; w?: number; projected: string };

export function lineLoadRows(lines: readonly LineLoadDraft[]): LineLoadRow[] {
  return lines.map((l) => ({ case: l.case, chord: l.chord.join(" "), w: l.w, projected: l.projected === false ? "along" : "projected" }));
}

/**
 * Rows back to line loads; the chord may be typed with spaces, commas or
 * semicolons between the joints. A separator just typed is kept as an empty
 * last entry, so the cell (which shows the chord joined again) does not eat
 * the space before the next joint; the cell trims it when left.
 */
export function lineLoadsFromRows(rows: readonly LineLoadRow[]): LineLoadDraft[] {
  return rows.map((r) => ({
    case: r.case,
    chord: r.chord === "" ? [] : r.chord.split(/[\s,;]+/),
    w: r.w,
    projected: r.projected !== "along",
  }));
}
