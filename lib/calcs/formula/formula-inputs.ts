import { z } from "zod";

/** Longest formula text accepted: far beyond a page of working, short enough to evaluate while typing. */
const MAX_SOURCE = 20000;

/**
 * Inputs of a Formula calc: lines of `name = expression` with units, `#`
 * comments, optional `-> unit`; other calcs' values are written `T1.F_U1L2_G`.
 * Results without `-> unit` are shown in the engineering units of
 * `preferredUnits`.
 */
export const formulaInputs = z.strictObject({
  source: z.string().max(MAX_SOURCE),
  preferredUnits: z.enum(["SI", "US"]).default("SI"),
});

/** Parsed inputs of a Formula calc. */
export type FormulaInputs = z.infer<typeof formulaInputs>;

/** A new Formula calc: a short worked example the author overwrites. */
export function formulaDefaults(): FormulaInputs {
  return {
    source: "# Midspan moment of a simply supported beam\nw = 5 kN/m\nL = 12 m\nM = w * L^2 / 8",
    preferredUnits: "SI",
  };
}
