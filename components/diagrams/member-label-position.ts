import type { Point } from "./fit-view-box";

export type LabelPosition = { x: number; y: number; anchor: "start" | "middle" | "end" };

export type MemberLabelPositionOptions = {
  /** Where along the member, 0 at `a` to 1 at `b`. */
  t?: number;
  /** The other side of the member from the preferred one. */
  flip?: boolean;
};

/**
 * Where a member's label goes: beside the member, offset square to it on the
 * upper side (left for a vertical), so it never sits on the line itself.
 */
export function memberLabelPosition(a: Point, b: Point, offset = 10, { t = 0.5, flip = false }: MemberLabelPositionOptions = {}): LabelPosition {
  const at = { x: a.x + (b.x - a.x) * t, y: a.y + (b.y - a.y) * t };
  const len = Math.hypot(b.x - a.x, b.y - a.y);
  if (len === 0) return { x: at.x, y: at.y - offset, anchor: "middle" };
  let n = { x: -(b.y - a.y) / len, y: (b.x - a.x) / len };
  // SVG y grows downward: "upper side" is negative y; for a vertical member prefer the left.
  if (n.y > 1e-9 || (Math.abs(n.y) <= 1e-9 && n.x > 0)) n = { x: -n.x, y: -n.y };
  if (flip) n = { x: -n.x, y: -n.y };
  const anchor = n.x > 0.35 ? "start" : n.x < -0.35 ? "end" : "middle";
  return { x: at.x + n.x * offset, y: at.y + n.y * offset, anchor };
}
