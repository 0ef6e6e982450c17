import type { InputColumn, InputRow } from "./input-column";
import type { PasteResult } from "./paste-block";

/** How many problems are spelled out before the rest are counted. */
const LISTED = 3;

/** A paste's problems in one sentence, or null when everything went in. */
export function describePaste<Row extends InputRow>(result: PasteResult<Row>, columns: readonly InputColumn<Row>[]): string | null {
  const parts: string[] = [];
  const { problems, clipped } = result;
  if (problems.length > 0) {
    const label = (key: string) => columns.find((c) => c.key === key)?.label ?? key;
    const listed = problems.slice(0, LISTED).map((p) => `row ${p.row + 1} ${label(p.key)}: ${p.message}`);
    const more = problems.length > LISTED ? `, and ${problems.length - LISTED} more` : "";
    parts.push(`${problems.length} ${problems.length === 1 ? "cell was" : "cells were"} not pasted (${listed.join("; ")}${more}).`);
  }
  if (clipped > 0) parts.push(`${clipped} ${clipped === 1 ? "value lies" : "values lie"} beyond the last column and ${clipped === 1 ? "was" : "were"} left out.`);
  return parts.length > 0 ? parts.join(" ") : null;
}
