import { SolveError } from "../errors";
import type { TrussModel } from "../types";
import type { TrussIndex } from "./index-truss";

/** Relative size, against the model's extent, below which two points count as one. */
export const GEOMETRY_TOLERANCE = 1e-9;

/**
 * Throws INVALID for the first member of zero length, then for the first pair
 * of members that lie on one line and share more than a point (a duplicate
 * or a bar laid over another), which a pin-jointed model cannot represent.
 * Candidate pairs come from a uniform grid, so a long truss costs O(m).
 */
export function checkMemberGeometry(model: TrussModel, index: TrussIndex): void {
  const { joints, members } = model;
  const { start, end } = index;
  const eps = GEOMETRY_TOLERANCE * modelExtent(model);
  const lengths = new Float64Array(members.length);
  members.forEach((member, i) => {
    const a = joints[start[i]];
    const b = joints[end[i]];
    lengths[i] = Math.hypot(b.x - a.x, b.y - a.y);
    if (!(lengths[i] > eps)) {
      throw new SolveError("INVALID", `Member ${member.id} has zero length: joints ${a.id} and ${b.id} are at the same point.`, { path: `members[${i}].end` });
    }
  });
  const pair = firstOverlap(model, index, lengths, eps);
  if (pair) {
    const [i, j] = pair;
    throw new SolveError(
      "INVALID",
      `Members ${members[i].id} and ${members[j].id} overlap: they lie on one line and share more than a joint. Remove one, or split them at a joint.`,
      { path: `members[${j}]` },
    );
  }
}

function modelExtent(model: TrussModel): number {
  let minX = Infinity, minY = Infinity, maxX = -Infinity, maxY = -Infinity;
  for (const j of model.joints) {
    minX = Math.min(minX, j.x); maxX = Math.max(maxX, j.x);
    minY = Math.min(minY, j.y); maxY = Math.max(maxY, j.y);
  }
  return Math.max(maxX - minX, maxY - minY);
}

/** The overlapping pair [i, j] (i < j) with the smallest j, then the smallest i; null when there is none. */
function firstOverlap(model: TrussModel, index: TrussIndex, lengths: Float64Array, eps: number): [number, number] | null {
  const { joints } = model;
  const { start, end } = index;
  const m = lengths.length;
  const sorted = Float64Array.from(lengths).sort();
  const extent = eps / GEOMETRY_TOLERANCE;
  // Cells near the typical member length keep both cells per member and members per cell small.
  const h = Math.max(sorted[m >> 1], sorted[m - 1] / 8, extent / 1e6);
  let minX = Infinity, minY = Infinity;
  for (const j of joints) { minX = Math.min(minX, j.x); minY = Math.min(minY, j.y); }
  const rows = Math.floor(extent / h) + 3;
  const cells = new Map<number, number[]>();
  let best: [number, number] | null = null;
  for (let i = 0; i < m; i++) {
    const a = joints[start[i]];
    const b = joints[end[i]];
    const x0 = Math.floor((Math.min(a.x, b.x) - minX - eps) / h) + 1;
    const x1 = Math.floor((Math.max(a.x, b.x) - minX + eps) / h) + 1;
    const y0 = Math.floor((Math.min(a.y, b.y) - minY - eps) / h) + 1;
    const y1 = Math.floor((Math.max(a.y, b.y) - minY + eps) / h) + 1;
    for (let cx = x0; cx <= x1; cx++) {
      for (let cy = y0; cy <= y1; cy++) {
        const key = cx * rows + cy;
        const list = cells.get(key);
        if (!list) { cells.set(key, [i]); continue; }
        for (const k of list) {
          if (overlaps(model, index, lengths, k, i, eps) && (!best || i < best[1] || (i === best[1] && k < best[0]))) best = [k, i];
        }
        list.push(i);
      }
    }
    // Members are visited in order, so the first j found with an overlap is the smallest.
    if (best) return best;
  }
  return best;
}

function overlaps(model: TrussModel, index: TrussIndex, lengths: Float64Array, p: number, q: number, eps: number): boolean {
  const { joints } = model;
  const p1 = joints[index.start[p]];
  const p2 = joints[index.end[p]];
  const q1 = joints[index.start[q]];
  const q2 = joints[index.end[q]];
  const ux = (p2.x - p1.x) / lengths[p];
  const uy = (p2.y - p1.y) / lengths[p];
  const off1 = ux * (q1.y - p1.y) - uy * (q1.x - p1.x);
  const off2 = ux * (q2.y - p1.y) - uy * (q2.x - p1.x);
  if (Math.abs(off1) > eps || Math.abs(off2) > eps) return false;
  const t1 = ux * (q1.x - p1.x) + uy * (q1.y - p1.y);
  const t2 = ux * (q2.x - p1.x) + uy * (q2.y - p1.y);
  const shared = Math.min(lengths[p], Math.max(t1, t2)) - Math.max(0, Math.min(t1, t2));
  return shared > eps;
}
