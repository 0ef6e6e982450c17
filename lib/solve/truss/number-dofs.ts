import { buildAdjacency } from "../sparse/build-adjacency";
import { reverseCuthillMcKee } from "../sparse/reverse-cuthill-mckee";
import type { TrussModel } from "../types";
import type { TrussIndex } from "./index-truss";

/**
 * How each joint's two displacement components map to equation numbers.
 * Every joint has its own basis (e1, e2): x and y, except at a roller, where
 * e2 is the roller's reaction line and e1 the direction it rolls along, so the
 * roller becomes an exact restraint on one component (no penalty stiffness).
 */
export type DofNumbering = {
  /** Number of free displacement components (equations). */
  n: number;
  /** Equation of the component along e1 / e2 of each joint; −1 where restrained. */
  dof1: Int32Array;
  dof2: Int32Array;
  /** Unit basis vectors per joint. */
  e1x: Float64Array;
  e1y: Float64Array;
  e2x: Float64Array;
  e2y: Float64Array;
  /** Joint (position in `model.joints`) of each equation. */
  jointOf: Int32Array;
  /** Half-bandwidth of the stiffness matrix in this numbering. */
  bandwidth: number;
};

/** Numbers the free components in reverse Cuthill–McKee order of the joints, which keeps the band narrow. */
export function numberDofs(model: TrussModel, index: TrussIndex): DofNumbering {
  const j = model.joints.length;
  const e1x = new Float64Array(j).fill(1);
  const e1y = new Float64Array(j);
  const e2x = new Float64Array(j);
  const e2y = new Float64Array(j).fill(1);
  const free1 = new Uint8Array(j).fill(1);
  const free2 = new Uint8Array(j).fill(1);
  for (const support of model.supports) {
    const k = index.jointIndex.get(support.joint) ?? -1;
    if (support.type === "pin") {
      free1[k] = 0;
      free2[k] = 0;
      continue;
    }
    const [dx, dy] = support.direction ?? [0, 1];
    const len = Math.hypot(dx, dy);
    e2x[k] = dx / len;
    e2y[k] = dy / len;
    e1x[k] = -e2y[k];
    e1y[k] = e2x[k];
    free2[k] = 0;
  }
  const order = reverseCuthillMcKee(buildAdjacency(j, index.start, index.end));
  const dof1 = new Int32Array(j).fill(-1);
  const dof2 = new Int32Array(j).fill(-1);
  const jointOf = new Int32Array(2 * j);
  let n = 0;
  for (const k of order) {
    if (free1[k]) { dof1[k] = n; jointOf[n++] = k; }
    if (free2[k]) { dof2[k] = n; jointOf[n++] = k; }
  }
  let bandwidth = 0;
  for (let e = 0; e < index.start.length; e++) {
    const a = index.start[e];
    const b = index.end[e];
    const lo = Math.min(firstDof(dof1[a], dof2[a]), firstDof(dof1[b], dof2[b]));
    const hi = Math.max(dof1[a], dof2[a], dof1[b], dof2[b]);
    if (hi >= 0 && lo < Infinity) bandwidth = Math.max(bandwidth, hi - lo);
  }
  // A joint's own two components are coupled even when no member links it to another.
  for (let k = 0; k < j; k++) if (dof1[k] >= 0 && dof2[k] >= 0) bandwidth = Math.max(bandwidth, 1);
  return { n, dof1, dof2, e1x, e1y, e2x, e2y, jointOf: jointOf.slice(0, n), bandwidth };
}

function firstDof(a: number, b: number): number {
  if (a >= 0) return a;
  return b >= 0 ? b : Infinity;
}
