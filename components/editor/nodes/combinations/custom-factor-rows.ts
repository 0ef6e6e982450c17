import { cellKey } from "@/components/editor/input-table/cell-key";
import type { InputColumn, InputRow } from "@/components/editor/input-table/input-column";
import type { CalcFieldError } from "@/lib/calcs/calc-types";

/** A custom combination as a table row: its name, and a factor per case in columns `f0`, `f1`… (by the truss's case order). */
export type FactorRow = InputRow & { name: string };

/** A custom factor set as stored. */
export type FactorSet = { name: string; factors: Record<string, number> };

/**
 * Columns keyed by position rather than by case id: an id is the author's
 * text ("name", "W-left") and must not collide with the row's own keys.
 */
export function factorColumns(caseIds: readonly string[]): InputColumn<FactorRow>[] {
  return [
    { key: "name", label: "Combination", kind: "text", width: "14rem", required: true },
    ...caseIds.map((id, i): InputColumn<FactorRow> => ({ key: `f${i}`, label: `γ ${id}`, kind: "number", aliases: [id] })),
  ];
}

/** The stored sets as rows; a case a set does not name shows blank (factor 0). */
export function factorRows(sets: readonly FactorSet[], caseIds: readonly string[]): FactorRow[] {
  return sets.map((s) => {
    const row: FactorRow = { name: s.name };
    caseIds.forEach((id, i) => {
      if (Object.hasOwn(s.factors, id)) row[`f${i}`] = s.factors[id];
    });
    return row;
  });
}

/**
 * The rows as sets to store. Factors of cases the truss no longer has are
 * kept from `previous`, so removing a case in the truss and adding it back
 * does not lose what the author typed.
 */
export function factorSetsFromRows(rows: readonly FactorRow[], caseIds: readonly string[], previous: readonly FactorSet[] = []): FactorSet[] {
  return rows.map((row, r) => {
    const kept = Object.entries(previous[r]?.factors ?? {}).filter(([id]) => !caseIds.includes(id));
    const factors: Record<string, number> = Object.fromEntries(kept);
    caseIds.forEach((id, i) => {
      const v = row[`f${i}`];
      if (typeof v === "number") factors[id] = v;
    });
    return { name: typeof row.name === "string" ? row.name : "", factors };
  });
}

/** The calc's problems on `custom[r].name` and `custom[r].factors.<case>` keyed by table cell. */
export function factorErrors(errors: readonly CalcFieldError[], caseIds: readonly string[]): Record<string, string> {
  const out: Record<string, string> = {};
  for (const e of errors) {
    const m = /^custom\[(\d+)\]\.(name|factors)(?:\.(.+))?$/.exec(e.path);
    if (!m) continue;
    const col = m[2] === "name" ? "name" : m[3] !== undefined && caseIds.includes(m[3]) ? `f${caseIds.indexOf(m[3])}` : "name";
    const k = cellKey(Number(m[1]), col);
    if (!(k in out)) out[k] = e.message;
  }
  return out;
}
