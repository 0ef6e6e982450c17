import type { TrussModel } from "../types";
import type { MechanismMode } from "./mechanism-joints";

/**
 * Why the truss can move, in words: the supports letting the whole truss
 * slide (parallel reactions) or turn about a point (concurrent reactions),
 * or an internal mechanism such as a panel without a diagonal. The first mode
 * is fitted with a rigid-body motion u = (a − θy, b + θx); a close fit means
 * the members are fine and the supports are at fault.
 */
export function describeMechanism(model: TrussModel, mode: MechanismMode | null): string {
  if (!mode) return "the members and supports form a mechanism";
  const { joints } = model;
  const n = joints.length;
  let cx = 0, cy = 0;
  for (const j of joints) { cx += j.x / n; cy += j.y / n; }
  // Least squares about the centroid decouples a, b and θ.
  let sa = 0, sb = 0, st = 0, sr = 0, norm = 0;
  for (let i = 0; i < n; i++) {
    const x = joints[i].x - cx;
    const y = joints[i].y - cy;
    sa += mode.ux[i];
    sb += mode.uy[i];
    st += x * mode.uy[i] - y * mode.ux[i];
    sr += x * x + y * y;
    norm += mode.ux[i] ** 2 + mode.uy[i] ** 2;
  }
  const a = sa / n;
  const b = sb / n;
  const theta = sr > 0 ? st / sr : 0;
  let residual = 0;
  for (let i = 0; i < n; i++) {
    const x = joints[i].x - cx;
    const y = joints[i].y - cy;
    residual += (mode.ux[i] - (a - theta * y)) ** 2 + (mode.uy[i] - (b + theta * x)) ** 2;
  }
  if (!(residual <= 1e-12 * norm)) return "the members form a mechanism (for example a panel without a diagonal)";
  const extent = Math.sqrt(sr / n);
  if (Math.abs(theta) * extent <= 1e-6 * Math.hypot(a, b)) {
    return "the supports let the whole truss slide: their reactions are all parallel, so nothing resists movement across them";
  }
  const px = cx - b / theta;
  const py = cy + a / theta;
  const size = Math.max(extent, Math.hypot(cx, cy));
  return `the supports let the whole truss turn about the point (${round(px, size)}, ${round(py, size)}): the lines of all reactions pass through it`;
}

/** Four significant figures, with round-off against the model's size shown as 0. */
function round(v: number, size: number): string {
  if (Math.abs(v) <= 1e-9 * size) return "0";
  return String(Number(v.toPrecision(4)));
}
