import type { SelectOption } from "@/components/editor/input-table/input-column";
import type { CalcResult, TrussValue } from "@/lib/calcs/calc-types";
import { loadCaseOptions } from "../combinations/truss-choices";

/**
 * Where a Member design calc may take its forces from: the governing
 * combinations of a Combinations calc of the same truss (each member checked
 * for its worst tension and its worst compression), or one load case or
 * combination of the truss.
 */
export function forceSourceOptions(results: Readonly<Record<string, CalcResult>>, trussLabel: string, truss: TrussValue | null, current: string): SelectOption[] {
  const envelopes: SelectOption[] = [];
  for (const r of Object.values(results)) {
    if (r.kind !== "combinations" || r.label === trussLabel) continue;
    const model = r.exports.model;
    const source = model && model.type === "truss" ? model.source : viewTruss(r.view);
    if (source === (truss?.source ?? trussLabel)) envelopes.push({ value: r.label, label: `${r.label}: governing of every combination` });
  }
  // A Combinations calc chosen as the truss carries its own envelope.
  if (truss?.envelope && truss.combinations.length > 0) envelopes.unshift({ value: trussLabel, label: `${trussLabel}: governing of every combination` });
  const cases = loadCaseOptions(truss, envelopes.some((e) => e.value === current) ? "" : current);
  return [...envelopes, ...cases];
}

function viewTruss(view: unknown): string | undefined {
  if (typeof view !== "object" || view === null) return undefined;
  const t = (view as { truss?: unknown }).truss;
  return typeof t === "string" ? t : undefined;
}
