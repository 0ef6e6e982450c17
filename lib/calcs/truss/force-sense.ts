import type { ForceSense } from "./truss-view";

/**
 * Whether a member force is tension or compression, with forces below a
 * millionth of the largest in the case (solver round-off) called zero.
 */
export function forceSense(force: number, scale: number): ForceSense {
  if (Math.abs(force) <= 1e-9 * Math.max(scale, 1e-300) || force === 0) return "zero";
  return force > 0 ? "tension" : "compression";
}

/** Rounds solver noise on a force to exactly zero so tables do not show 1e-13 kN. */
export function cleanForce(force: number, scale: number): number {
  return Math.abs(force) <= 1e-9 * scale ? 0 : force;
}
