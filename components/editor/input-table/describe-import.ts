import type { InputRow } from "./input-column";
import type { ImportResult } from "./import-rows";

/** An import's outcome as sentences for the report under the button: what came in, what did not and why. */
export function describeImport<Row extends InputRow>(result: ImportResult<Row>): string[] {
  if (result.error) return [result.error];
  const n = result.rows.length;
  const out = [`Imported ${n} ${n === 1 ? "row" : "rows"}.`];
  for (const s of result.skipped) out.push(`Line ${s.line} skipped: ${s.reason}.`);
  if (result.ignoredHeaders.length > 0) out.push(`Columns not used: ${result.ignoredHeaders.join(", ")}.`);
  if (result.missingColumns.length > 0 && n > 0) out.push(`Not in the file, left at their defaults: ${result.missingColumns.join(", ")}.`);
  return out;
}
