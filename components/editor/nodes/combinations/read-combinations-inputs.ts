import type { CombinationsInputs } from "@/lib/calcs/combinations/combinations-inputs";
import { readStandard } from "./combination-standards";
import type { FactorSet } from "./custom-factor-rows";

/**
 * The inputs as stored, read without trusting them, so the form opens on
 * whatever a document holds and the calc's own messages say what is wrong.
 */
export function readCombinationsInputs(raw: unknown): CombinationsInputs {
  const o = isRecord(raw) ? raw : {};
  const custom = Array.isArray(o.custom) ? o.custom.filter(isRecord).map(readSet) : undefined;
  const psi0 = isRecord(o.psi0) ? numbersOf(o.psi0) : undefined;
  return {
    truss: typeof o.truss === "string" ? o.truss : "",
    standard: readStandard(o.standard),
    ...(custom ? { custom } : {}),
    ...(psi0 ? { psi0 } : {}),
  };
}

function readSet(o: Record<string, unknown>): FactorSet {
  return { name: typeof o.name === "string" ? o.name : "", factors: isRecord(o.factors) ? numbersOf(o.factors) : {} };
}

function numbersOf(o: Record<string, unknown>): Record<string, number> {
  return Object.fromEntries(Object.entries(o).filter((e): e is [string, number] => typeof e[1] === "number"));
}

function isRecord(v: unknown): v is Record<string, unknown> {
  return typeof v === "object" && v !== null && !Array.isArray(v);
}
