import type { CalcFieldError, CalcValue, ForceEnvelope, TrussValue } from "../calc-types";
import { readTrussValue } from "../read-truss-value";
import { resolveLoadCase } from "../resolve-load-case";

/** Where a Member design calc's forces come from, once resolved. */
export type MemberForceSource =
  /** Governing tension and compression per member, from a Combinations calc. */
  | { kind: "envelope"; label: string; envelope: Record<string, ForceEnvelope> }
  /** One load case or combination of the truss. */
  | { kind: "case"; id: string; forces: Record<string, number> };

/**
 * Resolves `source`: a Combinations calc of the same truss (by label), the
 * truss's own envelope when the truss field already names a Combinations
 * calc, or a load case / combination of the truss (empty: its first case).
 */
export function memberForceSource(
  truss: TrussValue,
  inputs: { truss: string; source: string },
  resolved: Record<string, CalcValue>,
): { ok: true; source: MemberForceSource } | { ok: false; error: CalcFieldError } {
  const named = inputs.source && inputs.source !== inputs.truss ? readTrussValue(resolved, inputs.source) : null;
  if (named) {
    if (!named.envelope) return { ok: false, error: { path: "source", message: `${inputs.source} is a Truss calc; name a Combinations calc or a load case of ${inputs.truss}.` } };
    if (named.source !== truss.source) {
      return { ok: false, error: { path: "source", message: `${inputs.source} combines the cases of ${named.source ?? "another truss"}, not ${truss.source ?? inputs.truss}.` } };
    }
    return { ok: true, source: { kind: "envelope", label: inputs.source, envelope: named.envelope } };
  }
  if (inputs.source === inputs.truss && truss.envelope) return { ok: true, source: { kind: "envelope", label: inputs.source, envelope: truss.envelope } };
  const found = resolveLoadCase(truss, inputs.source, inputs.truss, "source");
  if (!found.ok && !inputs.source) return found;
  if (!found.ok) {
    const cases = truss.model.loadCases.map((c) => c.id).join(", ");
    return { ok: false, error: { path: "source", message: `"${inputs.source}" is neither a Combinations calc in this package nor a load case of ${inputs.truss} (it has ${cases || "no cases"}).` } };
  }
  return { ok: true, source: { kind: "case", id: found.id, forces: truss.solution.cases[found.id].forces } };
}
