import type { Point } from "./fit-view-box";

export type Segment = { a: Point; b: Point };

/**
 * The polyline of a section cut: through the midpoint of every cut member,
 * ordered along their main direction and carried past the outermost ones by
 * `overshoot`, so it visibly crosses the whole truss. Empty when nothing is cut.
 */
export function sectionLine(segments: Segment[], overshoot = 22): Point[] {
  const mids = segments
    .map((s) => ({ x: (s.a.x + s.b.x) / 2, y: (s.a.y + s.b.y) / 2 }))
    .filter((p) => Number.isFinite(p.x) && Number.isFinite(p.y));
  if (mids.length === 0) return [];

  const c = { x: mean(mids.map((p) => p.x)), y: mean(mids.map((p) => p.y)) };
  const axis = principalAxis(mids, c) ?? perpendicularOf(segments[0]);
  const ordered = mids
    .map((p) => ({ p, t: (p.x - c.x) * axis.x + (p.y - c.y) * axis.y }))
    .sort((l, r) => l.t - r.t);
  const first = ordered[0];
  const last = ordered[ordered.length - 1];
  const start = { x: first.p.x - axis.x * overshoot, y: first.p.y - axis.y * overshoot };
  const end = { x: last.p.x + axis.x * overshoot, y: last.p.y + axis.y * overshoot };
  return [start, ...ordered.map((o) => o.p), end];
}

/** Direction of largest spread of the midpoints (2×2 covariance), or null when they coincide. */
function principalAxis(points: Point[], c: Point): Point | null {
  let sxx = 0;
  let syy = 0;
  let sxy = 0;
  for (const p of points) {
    sxx += (p.x - c.x) ** 2;
    syy += (p.y - c.y) ** 2;
    sxy += (p.x - c.x) * (p.y - c.y);
  }
  if (sxx + syy < 1e-9) return null;
  const angle = 0.5 * Math.atan2(2 * sxy, sxx - syy);
  return { x: Math.cos(angle), y: Math.sin(angle) };
}

/** A single cut member (or coincident midpoints): cut square across the first member. */
function perpendicularOf(s: Segment): Point {
  const dx = s.b.x - s.a.x;
  const dy = s.b.y - s.a.y;
  const n = Math.hypot(dx, dy);
  return n > 0 ? { x: -dy / n, y: dx / n } : { x: 0, y: 1 };
}

function mean(v: number[]): number {
  return v.reduce((s, x) => s + x, 0) / v.length;
}
