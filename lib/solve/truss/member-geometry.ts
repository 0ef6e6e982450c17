import type { TrussModel } from "../types";
import type { TrussIndex } from "./index-truss";

/** Length and direction cosines (start → end) of every member, in model order. */
export type MemberGeometry = {
  /** Length L of each member. */
  length: Float64Array;
  /** cos θ and sin θ of each member's direction from start to end. */
  cx: Float64Array;
  cy: Float64Array;
};

/** Member lengths and unit directions; members are known to have non-zero length. */
export function memberGeometry(model: TrussModel, index: TrussIndex): MemberGeometry {
  const m = model.members.length;
  const length = new Float64Array(m);
  const cx = new Float64Array(m);
  const cy = new Float64Array(m);
  for (let e = 0; e < m; e++) {
    const a = model.joints[index.start[e]];
    const b = model.joints[index.end[e]];
    const dx = b.x - a.x;
    const dy = b.y - a.y;
    const L = Math.hypot(dx, dy);
    length[e] = L;
    cx[e] = dx / L;
    cy[e] = dy / L;
  }
  return { length, cx, cy };
}
