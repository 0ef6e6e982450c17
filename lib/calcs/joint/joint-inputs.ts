import { z } from "zod";
import { calcLabelSchema } from "../calc-label";

/**
 * Inputs of a Joint calc: equilibrium at one `joint` (ΣFx, ΣFy) with any
 * member forces already known carried in, or with `sequence: true` the whole
 * truss joint by joint in a solvable order. An empty `loadCase` means the
 * truss's first case.
 */
export const jointInputs = z
  .strictObject({
    truss: calcLabelSchema,
    loadCase: z.string().max(120).default(""),
    joint: z.string().max(40).optional(),
    /** Member forces already known (tension positive), in the truss's force unit. */
    known: z.record(z.string().max(40), z.number()).optional(),
    sequence: z.boolean().default(false),
  })
  .superRefine((o, ctx) => {
    if (!o.sequence && !o.joint) ctx.addIssue({ code: "custom", path: ["joint"], message: "choose a joint, or work the whole truss in sequence" });
  });

/** Parsed inputs of a Joint calc. */
export type JointInputs = z.infer<typeof jointInputs>;

/** A new Joint calc: the whole of T1 by the method of joints, first case. */
export function jointDefaults(): JointInputs {
  return { truss: "T1", loadCase: "", sequence: true };
}
