import type { Point } from "./types";

/** The z-component of a × b: positive when b turns counter-clockwise from a. */
export function cross(a: Point, b: Point): number {
  return a.x * b.y - a.y * b.x;
}
