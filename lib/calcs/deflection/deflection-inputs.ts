import { z } from "zod";
import { calcLabelSchema } from "../calc-label";

/**
 * Inputs of a Deflection calc: joint deflection of the referenced truss by
 * virtual work, in `direction`, checked against span / `limitRatio`. `span`
 * (in the truss's length unit) defaults to the truss's horizontal extent; an
 * empty `loadCase` means the truss's first case.
 */
export const deflectionInputs = z.strictObject({
  truss: calcLabelSchema,
  loadCase: z.string().max(120).default(""),
  joint: z.string().min(1).max(40),
  direction: z.enum(["x", "y"]).default("y"),
  limitRatio: z.number().positive().default(360),
  span: z.number().positive().optional(),
});

/** Parsed inputs of a Deflection calc. */
export type DeflectionInputs = z.infer<typeof deflectionInputs>;

/** A new Deflection calc: vertical deflection of joint L2 of T1 (midspan of the default truss), span/360. */
export function deflectionDefaults(): DeflectionInputs {
  return { truss: "T1", loadCase: "", joint: "L2", direction: "y", limitRatio: 360 };
}
