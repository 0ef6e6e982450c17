import { z } from "zod";
import { calcLabelSchema } from "../calc-label";

const id = z.string().max(40);

/**
 * Inputs of a Section cut calc: the Truss (or Combinations) calc it reads,
 * the load case or combination, the members cut and a joint on the side kept.
 * With no members the simplest solvable section through `panel` (or, for a
 * small truss, anywhere) is proposed and used; an empty `loadCase` means the
 * truss's first case, an empty `keep` the proposed side or the first joint.
 */
export const sectionCutInputs = z.strictObject({
  truss: calcLabelSchema,
  loadCase: z.string().max(120).default(""),
  members: z.array(id).max(3).default([]),
  keep: z.string().max(40).default(""),
  /** Panel to propose a cut through: index from 0 at the left, or its bottom-chord member id. */
  panel: z.union([z.number().int().min(0), id]).optional(),
});

/** Parsed inputs of a Section cut calc. */
export type SectionCutInputs = z.infer<typeof sectionCutInputs>;

/** A new Section cut: through the second panel of T1, first case, cut proposed. */
export function sectionCutDefaults(): SectionCutInputs {
  return { truss: "T1", loadCase: "", members: [], keep: "", panel: 1 };
}
