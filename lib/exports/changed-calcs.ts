import { createHash } from "node:crypto";
import { extractCalcs } from "@/lib/calcs/extract-calcs";
import { canonicalJson } from "@/lib/review/canonical-json";

export type CalcSide = { document: unknown; results: Record<string, unknown> };

/** SHA-256 of each calc's canonical label, inputs and results, by calc id. */
function calcHashes({ document, results }: CalcSide): Map<string, string> {
  return new Map(
    extractCalcs(document).map((c) => [c.id, createHash("sha256").update(canonicalJson({ label: c.label, inputs: c.inputs, result: results[c.id] ?? null })).digest("hex")]),
  );
}

/**
 * Calcs of `newer` that are new or whose inputs or results differ from `older`:
 * the sheets that carry the revision mark. A plain hash comparison is enough
 * here; lib/review/compare-revisions says what changed, this only says whether.
 */
export function changedCalcs(older: CalcSide | null, newer: CalcSide): string[] {
  if (!older) return [];
  const before = calcHashes(older);
  return [...calcHashes(newer)].filter(([id, h]) => before.get(id) !== h).map(([id]) => id);
}
