import type { CalcResult } from "@/lib/calcs/calc-types";
import { compareCalcs } from "@/lib/review/compare/compare-calcs";

export type CalcSide = { document: unknown; results: Record<string, unknown> };

/**
 * Calcs of `newer` that are new or whose inputs or results differ from `older`:
 * the sheets that carry the revision mark. The same comparison as the compare
 * page (lib/review/compare), so a sheet is marked exactly when that page lists its calc.
 */
export function changedCalcs(older: CalcSide | null, newer: CalcSide): string[] {
  if (!older) return [];
  const side = (s: CalcSide, label: string) => ({ document: s.document, results: s.results as Record<string, CalcResult>, label });
  return compareCalcs(side(older, "previous"), side(newer, "this")).filter((c) => c.change !== "removed").map((c) => c.calcId);
}
