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
  const seg = segments(model, index, lengths);
  const m = lengths.length;
  const sorted = Float64Array.from(lengths).sort();
  const extent = eps / GEOMETRY_TOLERANCE;
  // Cells a little longer than the typical member keep cells per member and members per cell small;
  // the odd factor and shifted origin keep regular panel points off the cell edges.
  const h = Math.max(1.37 * sorted[m >> 1], sorted[m - 1] / 8, extent / 1e6);
  let minX = Infinity, minY = Infinity;
  for (const j of model.joints) { minX = Math.min(minX, j.x); minY = Math.min(minY, j.y); }
  minX -= 0.29 * h;
  minY -= 0.29 * h;
  const rows = Math.floor(extent / h) + 4;
  const cellOf = new Map<number, number>();
  const pairCell: number[] = [];
  const pairMember: number[] = [];
  for (let i = 0; i < m; i++) {
    const x0 = Math.floor((Math.min(seg.ax[i], seg.bx[i]) - minX - eps) / h);
    const x1 = Math.floor((Math.max(seg.ax[i], seg.bx[i]) - minX + eps) / h);
    const y0 = Math.floor((Math.min(seg.ay[i], seg.by[i]) - minY - eps) / h);
    const y1 = Math.floor((Math.max(seg.ay[i], seg.by[i]) - minY + eps) / h);
    for (let cx = x0; cx <= x1; cx++) {
      for (let cy = y0; cy <= y1; cy++) {
        const key = cx * rows + cy;
        let cell = cellOf.get(key);
        if (cell === undefined) { cell = cellOf.size; cellOf.set(key, cell); }
        pairCell.push(cell);
        pairMember.push(i);
      }
    }
  }
  // Members of each cell, in member order (a counting sort keeps the order).
  const starts = new Int32Array(cellOf.size + 1);
  for (const c of pairCell) starts[c + 1]++;
  for (let c = 0; c < cellOf.size; c++) starts[c + 1] += starts[c];
  const fill = starts.slice(0, cellOf.size);
  const inCell = new Int32Array(pairCell.length);
  for (let k = 0; k < pairCell.length; k++) inCell[fill[pairCell[k]]++] = pairMember[k];
  let best: [number, number] | null = null;
  for (let c = 0; c < cellOf.size; c++) {
    for (let q = starts[c] + 1; q < starts[c + 1]; q++) {
      for (let p = starts[c]; p < q; p++) {
        const i = inCell[p];
        const j = inCell[q];
        if (best && (j > best[1] || (j === best[1] && i >= best[0]))) continue;
        if (overlaps(seg, i, j, eps)) best = [i, j];
      }
    }
  }
  return best;
}

type Segments = { ax: Float64Array; ay: Float64Array; bx: Float64Array; by: Float64Array; length: Float64Array };

function segments(model: TrussModel, index: TrussIndex, length: Float64Array): Segments {
  const m = length.length;
  const s: Segments = { ax: new Float64Array(m), ay: new Float64Array(m), bx: new Float64Array(m), by: new Float64Array(m), length };
  for (let e = 0; e < m; e++) {
    const a = model.joints[index.start[e]];
    const b = model.joints[index.end[e]];
    s.ax[e] = a.x; s.ay[e] = a.y; s.bx[e] = b.x; s.by[e] = b.y;
  }
  return s;
}

function overlaps(s: Segments, p: number, q: number, eps: number): boolean {
  const ux = (s.bx[p] - s.ax[p]) / s.length[p];
  const uy = (s.by[p] - s.ay[p]) / s.length[p];
  const off1 = ux * (s.ay[q] - s.ay[p]) - uy * (s.ax[q] - s.ax[p]);
  const off2 = ux * (s.by[q] - s.ay[p]) - uy * (s.bx[q] - s.ax[p]);
  if (Math.abs(off1) > eps || Math.abs(off2) > eps) return false;
  const t1 = ux * (s.ax[q] - s.ax[p]) + uy * (s.ay[q] - s.ay[p]);
  const t2 = ux * (s.bx[q] - s.ax[p]) + uy * (s.by[q] - s.ay[p]);
  const shared = Math.min(s.length[p], Math.max(t1, t2)) - Math.max(0, Math.min(t1, t2));
  return shared > eps;
}
