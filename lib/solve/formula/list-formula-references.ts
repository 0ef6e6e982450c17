import { dottedReferences } from "./safe-name";
import { splitFormulaLine } from "./split-formula-line";

/**
 * The other calcs' values a Formula calc reads (`T1.F_U1L2`), in order of first
 * use, comments ignored: what the calc graph needs as the calc's `references`.
 */
export function listFormulaReferences(source: string): string[] {
  const found = new Set<string>();
  for (const text of source.split(/\r\n|\r|\n/)) {
    const split = splitFormulaLine(text);
    if (split.kind !== "formula") continue;
    for (const ref of dottedReferences(split.expression)) found.add(ref);
  }
  return [...found];
}
