import type { Point } from "./fit-view-box";

export type WavePathOptions = { amplitude?: number; wavelength?: number };

/**
 * A gently wavy path along a polyline: the drafting convention for a section
 * line, so it is never mistaken for a member. Each straight piece gets whole
 * half-waves, so the wave meets every vertex on the line itself.
 */
export function wavePath(points: Point[], { amplitude = 3, wavelength = 14 }: WavePathOptions = {}): string {
  if (points.length < 2) return "";
  let d = `M${f(points[0].x)} ${f(points[0].y)}`;
  let side = 1;
  for (let i = 1; i < points.length; i++) {
    const a = points[i - 1];
    const b = points[i];
    const len = Math.hypot(b.x - a.x, b.y - a.y);
    if (len === 0) continue;
    const halves = Math.max(1, Math.round((2 * len) / wavelength));
    const u = { x: (b.x - a.x) / len, y: (b.y - a.y) / len };
    const perp = { x: -u.y, y: u.x };
    const step = len / halves;
    for (let k = 0; k < halves; k++) {
      // A quadratic curve peaks at half its control point's offset, hence 2 × amplitude.
      const mid = { x: a.x + u.x * step * (k + 0.5), y: a.y + u.y * step * (k + 0.5) };
      const c = { x: mid.x + perp.x * 2 * amplitude * side, y: mid.y + perp.y * 2 * amplitude * side };
      const end = { x: a.x + u.x * step * (k + 1), y: a.y + u.y * step * (k + 1) };
      d += `Q${f(c.x)} ${f(c.y)} ${f(end.x)} ${f(end.y)}`;
      side = -side;
    }
  }
  return d;
}

function f(v: number): string {
  return String(Math.round(v * 100) / 100);
}
