import type { DofNumbering } from "./number-dofs";

/** Global x–y components of every joint's displacement. */
export type GlobalDisplacements = { ux: Float64Array; uy: Float64Array };

/** Global x–y displacements from the free components, each joint in its own basis (restrained components are zero). */
export function toGlobal(x: ArrayLike<number>, dofs: DofNumbering, jointCount: number): GlobalDisplacements {
  const ux = new Float64Array(jointCount);
  const uy = new Float64Array(jointCount);
  for (let i = 0; i < jointCount; i++) {
    const a = dofs.dof1[i] >= 0 ? x[dofs.dof1[i]] : 0;
    const b = dofs.dof2[i] >= 0 ? x[dofs.dof2[i]] : 0;
    ux[i] = a * dofs.e1x[i] + b * dofs.e2x[i];
    uy[i] = a * dofs.e1y[i] + b * dofs.e2y[i];
  }
  return { ux, uy };
}
