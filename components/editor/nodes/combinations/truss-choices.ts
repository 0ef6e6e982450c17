import type { SelectOption } from "@/components/editor/input-table/input-column";
import type { CalcResult, TrussValue } from "@/lib/calcs/calc-types";

/** A calc whose solved truss (`Label.model`) another calc may read. */
export type TrussChoice = {
  label: string;
  kind: "truss" | "combinations";
  /** The solved truss, or null while that calc has a problem. */
  value: TrussValue | null;
};

/** The calcs of the package that export a truss, in document order, limited to `kinds`. */
export function trussChoices(results: Readonly<Record<string, CalcResult>>, kinds: readonly TrussChoice["kind"][] = ["truss"]): TrussChoice[] {
  const out: TrussChoice[] = [];
  for (const r of Object.values(results)) {
    if (r.kind !== "truss" && r.kind !== "combinations") continue;
    if (!kinds.includes(r.kind)) continue;
    out.push({ label: r.label, kind: r.kind, value: modelOf(r) });
  }
  return out;
}

/** The solved truss the calc labelled `label` exports, or null. */
export function trussValueOf(results: Readonly<Record<string, CalcResult>>, label: string): TrussValue | null {
  for (const r of Object.values(results)) if (r.label === label) return modelOf(r);
  return null;
}

/**
 * Options for a truss picker. A label that names no truss calc (renamed or
 * deleted) stays selectable, marked, so the stored reference is never
 * replaced behind the author's back.
 */
export function trussOptions(choices: readonly TrussChoice[], current: string): SelectOption[] {
  const options = choices.map((c) => ({
    value: c.label,
    label: c.kind === "truss" ? `${c.label}${c.value ? "" : " (has a problem)"}` : `${c.label}: ${c.value?.source ?? "a truss"} with its combinations`,
  }));
  if (current && !choices.some((c) => c.label === current)) options.unshift({ value: current, label: `${current} (no such truss calc)` });
  return options;
}

/**
 * Options for a load case of a truss: every case (and, for a Combinations
 * calc, every combination), with "" for the first case. An entered name the
 * truss does not have stays listed, marked.
 */
export function loadCaseOptions(value: TrussValue | null, current: string): SelectOption[] {
  const ids = value ? value.model.loadCases.map((c) => c.id) : [];
  const combos = new Set(value?.combinations ?? []);
  const options: SelectOption[] = [{ value: "", label: ids.length ? `First load case (${ids[0]})` : "First load case" }];
  for (const id of ids) {
    const kind = value?.caseKinds?.[id];
    options.push({ value: id, label: combos.has(id) ? `Combination ${id}` : `Load case ${id}${kind && kind !== id ? ` (${kind})` : ""}` });
  }
  if (current && !ids.includes(current)) options.push({ value: current, label: `${current} (not in this truss)` });
  return options;
}

function modelOf(r: CalcResult): TrussValue | null {
  const v = r.exports.model;
  return v && v.type === "truss" ? v : null;
}
