import type { FormulaInputs } from "@/lib/calcs/formula/formula-inputs";

/**
 * The inputs as stored, read without trusting them: the form must still open
 * (and show the calc's own message) when a document holds something odd.
 */
export function readFormulaInputs(raw: unknown): FormulaInputs {
  const o = typeof raw === "object" && raw !== null ? (raw as Record<string, unknown>) : {};
  return {
    source: typeof o.source === "string" ? o.source : "",
    preferredUnits: o.preferredUnits === "US" ? "US" : "SI",
  };
}
