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
  let mean = 0, longest = 0;
  for (let e = 0; e < m; e++) { mean += lengths[e] / m; longest = Math.max(longest, lengths[e]); }
  const extent = eps / GEOMETRY_TOLERANCE;
  // Cells a little longer than the typical member keep cells per member and members per cell small;
  // the odd factor and shifted origin keep regular panel points off the cell edges.
  const h = Math.max(1.37 * mean, longest / 8, extent / 1e6);
  let minX = Infinity, minY = Infinity, maxX = -Infinity, maxY = -Infinity;
  for (const j of model.joints) {
    minX = Math.min(minX, j.x); maxX = Math.max(maxX, j.x);
    minY = Math.min(minY, j.y); maxY = Math.max(maxY, j.y);
  }
  minX -= 0.29 * h;
  minY -= 0.29 * h;
  const cols = Math.floor((maxX - minX + eps) / h) + 2;
  const rows = Math.floor((maxY - minY + eps) / h) + 2;
  // A dense table of cells when the grid is small (long trusses), a map otherwise.
  const table = cols * rows <= 8 * m + 1024 ? new Int32Array(cols * rows).fill(-1) : null;
  const cellOf = new Map<number, number>();
  let cells = 0;
  let pairCell = new Int32Array(4 * m);
  let pairMember = new Int32Array(4 * m);
  let pairs = 0;
  for (let i = 0; i < m; i++) {
    const x0 = Math.max(0, Math.floor((seg.minX[i] - minX - eps) / h));
    const x1 = Math.min(cols - 1, Math.floor((seg.maxX[i] - minX + eps) / h));
    const y0 = Math.max(0, Math.floor((seg.minY[i] - minY - eps) / h));
    const y1 = Math.min(rows - 1, Math.floor((seg.maxY[i] - minY + eps) / h));
    for (let cx = x0; cx <= x1; cx++) {
      for (let cy = y0; cy <= y1; cy++) {
        const key = cx * rows + cy;
        let cell = table ? table[key] : (cellOf.get(key) ?? -1);
        if (cell < 0) {
          cell = cells++;
          if (table) table[key] = cell;
          else cellOf.set(key, cell);
        }
        if (pairs === pairCell.length) { pairCell = grow(pairCell); pairMember = grow(pairMember); }
        pairCell[pairs] = cell;
        pairMember[pairs++] = i;
      }
    }
  }
  // Members of each cell, in member order (a counting sort keeps the order).
  const starts = new Int32Array(cells + 1);
  for (let k = 0; k < pairs; k++) starts[pairCell[k] + 1]++;
  for (let c = 0; c < cells; c++) starts[c + 1] += starts[c];
  const fill = starts.slice(0, cells);
  const inCell = new Int32Array(pairs);
  for (let k = 0; k < pairs; k++) inCell[fill[pairCell[k]]++] = pairMember[k];
  let best: [number, number] | null = null;
  for (let c = 0; c < cells; c++) {
    for (let q = starts[c] + 1; q < starts[c + 1]; q++) {
      const j = inCell[q];
      if (best && j > best[1]) continue;
      for (let p = starts[c]; p < q; p++) {
        const i = inCell[p];
        if (best && j === best[1] && i >= best[0]) break;
        if (overlaps(seg, i, j, eps)) best = [i, j];
      }
    }
  }
  return best;
}

function grow(a: Int32Array<ArrayBuffer>): Int32Array<ArrayBuffer> {
  const b = new Int32Array(a.length * 2);
  b.set(a);
  return b;
}

type Segments = {
  ax: Float64Array; ay: Float64Array; ux: Float64Array; uy: Float64Array; length: Float64Array;
  minX: Float64Array; maxX: Float64Array; minY: Float64Array; maxY: Float64Array;
};

function segments(model: TrussModel, index: TrussIndex, length: Float64Array): Segments {
  const m = length.length;
  const f = () => new Float64Array(m);
  const s: Segments = { ax: f(), ay: f(), ux: f(), uy: f(), length, minX: f(), maxX: f(), minY: f(), maxY: f() };
  for (let e = 0; e < m; e++) {
    const a = model.joints[index.start[e]];
    const b = model.joints[index.end[e]];
    s.ax[e] = a.x;
    s.ay[e] = a.y;
    s.ux[e] = (b.x - a.x) / length[e];
    s.uy[e] = (b.y - a.y) / length[e];
    s.minX[e] = Math.min(a.x, b.x);
    s.maxX[e] = Math.max(a.x, b.x);
    s.minY[e] = Math.min(a.y, b.y);
    s.maxY[e] = Math.max(a.y, b.y);
  }
  return s;
}

/** Member q lies on member p's line (within eps at both ends) and their spans share more than eps. */
function overlaps(s: Segments, p: number, q: number, eps: number): boolean {
  if (s.minX[q] > s.maxX[p] + eps || s.maxX[q] < s.minX[p] - eps || s.minY[q] > s.maxY[p] + eps || s.maxY[q] < s.minY[p] - eps) return false;
  const ux = s.ux[p];
  const uy = s.uy[p];
  const q1x = s.ax[q] - s.ax[p];
  const q1y = s.ay[q] - s.ay[p];
  const q2x = q1x + s.ux[q] * s.length[q];
  const q2y = q1y + s.uy[q] * s.length[q];
  if (Math.abs(ux * q1y - uy * q1x) > eps || Math.abs(ux * q2y - uy * q2x) > eps) return false;
  const t1 = ux * q1x + uy * q1y;
  const t2 = ux * q2x + uy * q2y;
  const shared = Math.min(s.length[p], Math.max(t1, t2)) - Math.max(0, Math.min(t1, t2));
  return shared > eps;
}
