import { cross } from "./cross";
import { PARALLEL_TOLERANCE } from "./parallel-tolerance";
import type { Line, Point } from "./types";

/** Where two lines of action meet, or null when they are parallel (or the same line). */
export function lineIntersection(a: Line, b: Line): Point | null {
  const denom = cross(a.direction, b.direction);
  if (Math.abs(denom) < PARALLEL_TOLERANCE) return null;
  const w = { x: b.point.x - a.point.x, y: b.point.y - a.point.y };
  const t = cross(w, b.direction) / denom;
  return { x: a.point.x + t * a.direction.x, y: a.point.y + t * a.direction.y };
}
