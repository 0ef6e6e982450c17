import type { Point } from "./fit-view-box";

export type ArrowPathOptions = {
  /** Where the arrow points to (SVG coordinates). */
  tip: Point;
  /** The way the force acts, in SVG coordinates (y down); any length but zero. */
  direction: Point;
  /** Tail to tip, head included. */
  length: number;
  /** Length of the head; its width is proportional. */
  head?: number;
};

export type ArrowPath = {
  /** `d` of the shaft, tail to the base of the head. */
  shaft: string;
  /** `d` of the closed head triangle. */
  head: string;
  tail: Point;
  tip: Point;
  /** Unit vector of `direction`. */
  unit: Point;
};

/** An arrow as two SVG paths, or null when the direction has no length (nothing to point along). */
export function arrowPath({ tip, direction, length, head = 8 }: ArrowPathOptions): ArrowPath | null {
  const n = Math.hypot(direction.x, direction.y);
  if (!(n > 0) || !Number.isFinite(n) || !(length > 0)) return null;
  const u = { x: direction.x / n, y: direction.y / n };
  // A short arrow keeps a visible shaft: the head takes at most half of it.
  const h = Math.min(head, length / 2);
  const w = h * 0.45;
  const tail = { x: tip.x - u.x * length, y: tip.y - u.y * length };
  const base = { x: tip.x - u.x * h, y: tip.y - u.y * h };
  const perp = { x: -u.y, y: u.x };
  return {
    shaft: `M${f(tail.x)} ${f(tail.y)}L${f(base.x)} ${f(base.y)}`,
    head: `M${f(tip.x)} ${f(tip.y)}L${f(base.x + perp.x * w)} ${f(base.y + perp.y * w)}L${f(base.x - perp.x * w)} ${f(base.y - perp.y * w)}Z`,
    tail,
    tip,
    unit: u,
  };
}

export type ArrowLengthOptions = { min?: number; max?: number };

/**
 * Arrow length for a force, scaled to the largest force drawn: linear from
 * `min` (a tiny load is still visible) to `max` (the largest load).
 */
export function arrowLength(magnitude: number, largest: number, { min = 18, max = 44 }: ArrowLengthOptions = {}): number {
  if (!(largest > 0) || !Number.isFinite(magnitude)) return min;
  return min + (max - min) * Math.min(1, Math.abs(magnitude) / largest);
}

function f(v: number): string {
  return String(Math.round(v * 100) / 100);
}
