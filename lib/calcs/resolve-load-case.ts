import type { CalcFieldError, TrussValue } from "./calc-types";

/**
 * The load case (or combination) a calc works on: as entered, or the truss's
 * first case when left empty. A name the truss does not have is a field
 * error on `field`, listing what it has.
 */
export function resolveLoadCase(
  truss: TrussValue,
  entered: string,
  trussLabel: string,
  field = "loadCase",
): { ok: true; id: string } | { ok: false; error: CalcFieldError } {
  const available = truss.model.loadCases.map((c) => c.id);
  const id = entered || available[0];
  if (id !== undefined && Object.hasOwn(truss.solution.cases, id)) return { ok: true, id };
  if (id === undefined) return { ok: false, error: { path: field, message: `${trussLabel} has no load cases yet.` } };
  return { ok: false, error: { path: field, message: `"${id}" is not a load case or combination of ${trussLabel} (it has ${available.join(", ")}).` } };
}
