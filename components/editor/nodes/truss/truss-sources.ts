import type { PackageEvaluation, TrussValue } from "@/lib/calcs/calc-types";

/** A calc another calc may read a truss from: a Truss calc, or a Combinations calc with its combinations added. */
export type TrussSource = { label: string; kind: "truss" | "combinations"; value: TrussValue | null };

/**
 * The Truss and Combinations calcs of the package, in document order, each
 * with its solved truss when it has one (null while it has a problem), for
 * the pickers of the Section cut, Joint and other reading calcs.
 */
export function trussSources(evaluation: { results: PackageEvaluation["results"] }): TrussSource[] {
  return Object.values(evaluation.results).flatMap((r) => {
    if (r.kind !== "truss" && r.kind !== "combinations") return [];
    const v = r.exports.model;
    return [{ label: r.label, kind: r.kind, value: v && v.type === "truss" ? v : null }];
  });
}

/** The load cases and combinations a truss offers, by id, with a word on what each is. */
export function trussCases(value: TrussValue | null): { id: string; label: string }[] {
  if (!value) return [];
  const combinations = new Set(value.combinations);
  return value.model.loadCases.map((c) => {
    const kind = value.caseKinds?.[c.id];
    const label = combinations.has(c.id) ? `${c.id} (combination)` : kind && kind !== c.id ? `${c.id} (${kind})` : c.id;
    return { id: c.id, label };
  });
}
