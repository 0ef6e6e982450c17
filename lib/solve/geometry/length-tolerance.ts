import type { TrussModel } from "../types";

/**
 * A distance below which two points are the same point: a billionth of the
 * truss's overall size, so it works in mm and in ft alike.
 */
export function lengthTolerance(model: TrussModel): number {
  if (model.joints.length === 0) return 1e-9;
  const xs = model.joints.map((j) => j.x);
  const ys = model.joints.map((j) => j.y);
  const size = Math.max(Math.max(...xs) - Math.min(...xs), Math.max(...ys) - Math.min(...ys));
  return 1e-9 * (size > 0 ? size : 1);
}
