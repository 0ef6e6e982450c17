import type { LoadCase } from "../types";
import type { TrussIndex } from "./index-truss";

/** Total applied force per joint for one load case (several loads on one joint add up). */
export type JointLoadTotals = { fx: Float64Array; fy: Float64Array };

/** Sums a load case's loads joint by joint, in model order. */
export function jointLoads(loadCase: LoadCase, index: TrussIndex, jointCount: number): JointLoadTotals {
  const fx = new Float64Array(jointCount);
  const fy = new Float64Array(jointCount);
  for (const load of loadCase.loads) {
    const k = index.jointIndex.get(load.joint) ?? -1;
    fx[k] += load.fx ?? 0;
    fy[k] += load.fy ?? 0;
  }
  return { fx, fy };
}
