import { SolveError } from "../errors";
import type { EvaluateFormulasOptions, Quantity, UnitSystem } from "./formula-types";

/** Upper bound on a formula calc, so one calc cannot stall a package recompute. */
export const MAX_FORMULA_LINES = 2000;

const SCOPE_NAME = /^[A-Za-z][A-Za-z0-9_]*(\.[A-Za-z][A-Za-z0-9_]*)?$/;

/**
 * Checks what the caller (not the author) supplies; throws SolveError INVALID
 * with the offending path. The author's mistakes in `source` are line errors instead.
 */
export function validateFormulaOptions(options: EvaluateFormulasOptions): { lines: string[]; system: UnitSystem; scope: [string, Quantity][] } {
  if (typeof options?.source !== "string") throw new SolveError("INVALID", "source must be text", { path: "source" });
  const lines = options.source.split(/\r\n|\r|\n/);
  if (lines.length > MAX_FORMULA_LINES) {
    throw new SolveError("INVALID", `a formula calc has at most ${MAX_FORMULA_LINES} lines`, { path: "source" });
  }
  const system = options.preferredUnits ?? "SI";
  if (system !== "SI" && system !== "US") {
    throw new SolveError("INVALID", 'preferredUnits must be "SI" or "US"', { path: "preferredUnits" });
  }
  const scope = Object.entries(options.scope ?? {});
  for (const [name, q] of scope) {
    const path = `scope.${name}`;
    if (!SCOPE_NAME.test(name)) throw new SolveError("INVALID", `${name} is not a valid value name`, { path });
    if (typeof q?.value !== "number" || !Number.isFinite(q.value)) {
      throw new SolveError("INVALID", `${name} has no finite value`, { path: `${path}.value` });
    }
    if (typeof q.unit !== "string") throw new SolveError("INVALID", `${name} has no unit text`, { path: `${path}.unit` });
  }
  return { lines, system, scope };
}
