import type { TrussModel } from "../types";
import { lengthTolerance } from "./length-tolerance";
import type { PivotKind, Point } from "./types";

/** Says what a moment point is: a supported joint, another joint, or a point off the truss. */
export function classifyPoint(model: TrussModel, p: Point): PivotKind {
  const tol = lengthTolerance(model);
  const joint = model.joints.find((j) => Math.hypot(j.x - p.x, j.y - p.y) <= tol);
  if (!joint) return { kind: "off-truss point" };
  return model.supports.some((s) => s.joint === joint.id)
    ? { kind: "support", joint: joint.id }
    : { kind: "joint", joint: joint.id };
}
