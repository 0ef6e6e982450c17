import type { SelectOption } from "@/components/editor/input-table/input-column";
import { combinationStandards } from "@/lib/calcs/combinations/combinations-inputs";

export type CombinationStandard = (typeof combinationStandards)[number];

/** Each set by its edition and equations, as a package's design criteria name it. */
const NAMES: Record<CombinationStandard, string> = {
  "ASCE7-16-LRFD": "ASCE/SEI 7-16 strength design (LRFD), §2.3.1",
  "ASCE7-22-LRFD": "ASCE/SEI 7-22 strength design (LRFD), §2.3.1",
  "ASCE7-16-ASD": "ASCE/SEI 7-16 allowable stress design (ASD), §2.4.1",
  "EN1990-6.10": "EN 1990 Eq. 6.10, STR/GEO set B",
  "EN1990-6.10ab": "EN 1990 Eq. 6.10a and 6.10b, STR/GEO set B",
  custom: "Custom factors",
};

/** Load-case kinds each family combines; the truss's other kinds need custom factors. */
const ASCE_KINDS = ["D", "L", "Lr", "S", "R", "W"] as const;
const EN_KINDS = ["G", "Q", "S", "W"] as const;

/** The standard's options for a picker, in the order of the inputs' enum. */
export const standardOptions: SelectOption[] = combinationStandards.map((s) => ({ value: s, label: NAMES[s] }));

/** The stored standard, or the inputs' default for anything else. */
export function readStandard(raw: unknown): CombinationStandard {
  return combinationStandards.find((s) => s === raw) ?? "EN1990-6.10";
}

/** The kinds of load case a published set combines; null for custom factors, which take any case. */
export function kindsCombined(standard: CombinationStandard): readonly string[] | null {
  if (standard === "custom") return null;
  return standard.startsWith("EN") ? EN_KINDS : ASCE_KINDS;
}

/** Whether ψ0 (EN 1990 Table A1.1) applies to the set, so the form offers it per case. */
export function usesPsi0(standard: CombinationStandard): boolean {
  return standard.startsWith("EN");
}

/** The set's name in words. */
export function standardName(standard: CombinationStandard): string {
  return NAMES[standard];
}
