import type { TrussModel } from "../types";

/** Id of the single load case of the virtual model. */
export const UNIT_LOAD_CASE = "unit";

/**
 * The same truss with one load case: a unit force at `joint` along +x or +y.
 * Its member forces are the n of virtual work (force per unit virtual load).
 */
export function unitLoadModel(model: TrussModel, joint: string, direction: "x" | "y"): TrussModel {
  const load = direction === "x" ? { joint, fx: 1 } : { joint, fy: 1 };
  return { ...model, loadCases: [{ id: UNIT_LOAD_CASE, loads: [load] }] };
}
