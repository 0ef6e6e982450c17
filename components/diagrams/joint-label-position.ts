import type { Point } from "./fit-view-box";
import type { LabelPosition } from "./member-label-position";

/**
 * Where a joint's label goes: on the side facing away from its members, which
 * is where the drawing is emptiest, optionally turned by `turn` radians (for
 * alternatives when that spot is taken). A joint balanced on all sides (or
 * with no members) gets its label above and to the left.
 */
export function jointLabelPosition(at: Point, neighbours: Point[], distance = 13, turn = 0): LabelPosition {
  let sx = 0;
  let sy = 0;
  for (const p of neighbours) {
    const len = Math.hypot(p.x - at.x, p.y - at.y);
    if (len > 0) {
      sx += (p.x - at.x) / len;
      sy += (p.y - at.y) / len;
    }
  }
  const n = Math.hypot(sx, sy);
  const base = n > 0.2 ? { x: -sx / n, y: -sy / n } : { x: -Math.SQRT1_2, y: -Math.SQRT1_2 };
  const c = Math.cos(turn);
  const s = Math.sin(turn);
  const away = { x: base.x * c - base.y * s, y: base.x * s + base.y * c };
  const anchor = away.x > 0.35 ? "start" : away.x < -0.35 ? "end" : "middle";
  return { x: at.x + away.x * distance, y: at.y + away.y * distance, anchor };
}
