import { z } from "zod";
import { calcLabelSchema } from "../calc-label";

/** Published combination sets, and "custom" for factors entered by the author. */
export const combinationStandards = ["ASCE7-16-LRFD", "ASCE7-22-LRFD", "ASCE7-16-ASD", "EN1990-6.10", "EN1990-6.10ab", "custom"] as const;

const customSet = z.strictObject({
  /** The combination's name as it appears in tables, e.g. "SLS characteristic". */
  name: z.string().min(1).max(60),
  /** Factor per load case id; cases not named take 0. */
  factors: z.record(z.string().max(40), z.number()),
});

/**
 * Inputs of a Combinations calc: the Truss calc whose load cases are
 * combined, the published set (case kinds come from the truss: D, L, Lr, S,
 * R, W for ASCE/SEI 7; G, Q, S, W for EN 1990) or custom factor sets, and
 * optional ψ0 per EN 1990 case.
 */
export const combinationsInputs = z
  .strictObject({
    truss: calcLabelSchema,
    standard: z.enum(combinationStandards).default("EN1990-6.10"),
    custom: z.array(customSet).max(50).optional(),
    /** EN 1990 only: ψ0 per case id, overriding the default of its kind (Table A1.1). */
    psi0: z.record(z.string().max(40), z.number().min(0).max(1)).optional(),
  })
  .superRefine((o, ctx) => {
    if (o.standard === "custom" && !(o.custom && o.custom.length > 0)) {
      ctx.addIssue({ code: "custom", path: ["custom"], message: "add at least one factor set, or choose a published standard" });
    }
  });

/** Parsed inputs of a Combinations calc. */
export type CombinationsInputs = z.infer<typeof combinationsInputs>;

/** A new Combinations calc: EN 1990 Eq. 6.10 over T1. */
export function combinationsDefaults(): CombinationsInputs {
  return { truss: "T1", standard: "EN1990-6.10" };
}
