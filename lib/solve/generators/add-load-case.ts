import { z } from "zod";
import { SolveError } from "../errors";
import type { JointLoad, TrussModel } from "../types";
import { finiteNumber } from "./finite-number";
import { invalidFromZod } from "./invalid-from-zod";

const schema = z.strictObject({
  id: z.string().refine((s) => s.trim().length > 0, "must not be empty"),
  loads: z.array(z.strictObject({ joint: z.string().min(1, "must not be empty"), fx: finiteNumber().optional(), fy: finiteNumber().optional() })),
});

/**
 * Returns a copy of `model` with one more load case (the model passed in is
 * left as it was). Throws SolveError "INVALID" when the id is already used or
 * a load names a joint the model does not have.
 */
export function addLoadCase(model: TrussModel, id: string, loads: JointLoad[]): TrussModel {
  const parsed = schema.safeParse({ id, loads });
  if (!parsed.success) throw invalidFromZod(parsed.error, "load case");
  if (model.loadCases.some((c) => c.id === parsed.data.id)) {
    throw new SolveError("INVALID", `load case: id ${parsed.data.id} is already used`, { path: "id" });
  }
  const known = new Set(model.joints.map((j) => j.id));
  parsed.data.loads.forEach((load, i) => {
    if (!known.has(load.joint)) throw new SolveError("INVALID", `load case: joint ${load.joint} is not in the model`, { path: `loads[${i}].joint` });
  });
  return { ...model, loadCases: [...model.loadCases, { id: parsed.data.id, loads: parsed.data.loads.map((l) => ({ ...l })) }] };
}
