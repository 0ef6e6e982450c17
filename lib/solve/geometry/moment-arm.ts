import { cross } from "./cross";
import type { Point } from "./types";

/**
 * Signed perpendicular distance from `pivot` to the line through `point` along
 * the unit `direction`: a force F along `direction` has moment F × arm about
 * the pivot, counter-clockwise positive.
 */
export function momentArm(pivot: Point, point: Point, direction: Point): number {
  return cross({ x: point.x - pivot.x, y: point.y - pivot.y }, direction);
}
