import { arrowLength, arrowPath, type ArrowPath } from "./arrow-path";
import type { Point } from "./fit-view-box";
import { formatNumber } from "./format-number";
import type { ForceVector } from "./force-vectors";
import type { LabelPosition } from "./member-label-position";

export type ArrowSpec = {
  key: string;
  joint: string;
  path: ArrowPath;
  /** Drawn leaving the joint (tail at the joint) because the usual side, tip at the joint, is occupied. */
  pulled: boolean;
  text: string;
  label: LabelPosition;
};

/** `side` is the unit vector (SVG axes) from the joint toward where the shaft would lie. */
type SideTest<T> = (v: ForceVector, side: Point) => T;

export type ForceArrowsOptions = {
  vectors: ForceVector[];
  /** Joint positions in SVG coordinates; vectors at unknown joints are skipped. */
  at: (joint: string) => Point | undefined;
  /** The force that gets the longest arrow; share it between loads and reactions so they compare. */
  largest: number;
  /** Distance from the joint centre to the near end of the arrow, clear of the joint marker or support symbol. */
  gap: number | SideTest<number>;
  /** Whether a member or symbol lies on that side; a blocked usual side flips the arrow to the free one. */
  blocked?: SideTest<boolean>;
  unit: string;
  min?: number;
  max?: number;
};

/**
 * Arrows for forces at joints, length by magnitude, labelled with magnitude and
 * unit. An arrow normally points at its joint; where that would lay it along a
 * member (a deck load at a bottom-chord joint under a vertical), it hangs from
 * the joint instead, as is usual on drawings.
 */
export function forceArrows({ vectors, at, largest, gap, blocked, unit, min, max }: ForceArrowsOptions): ArrowSpec[] {
  const out: ArrowSpec[] = [];
  vectors.forEach((v, i) => {
    const joint = at(v.joint);
    if (!joint) return;
    // Model y is up, SVG y is down.
    const direction = { x: v.fx, y: -v.fy };
    const n = Math.hypot(direction.x, direction.y);
    if (!(n > 0)) return;
    const u = { x: direction.x / n, y: direction.y / n };
    const behind = { x: -u.x, y: -u.y };
    const pulled = blocked !== undefined && blocked(v, behind) && !blocked(v, u);
    const side = pulled ? u : behind;
    const g = typeof gap === "number" ? gap : gap(v, side);
    const length = arrowLength(Math.hypot(v.fx, v.fy), largest, { min, max });
    const tip = pulled
      ? { x: joint.x + u.x * (g + length), y: joint.y + u.y * (g + length) }
      : { x: joint.x - u.x * g, y: joint.y - u.y * g };
    const path = arrowPath({ tip, direction, length });
    if (!path) return;
    const magnitude = formatNumber(Math.hypot(v.fx, v.fy));
    out.push({ key: `${v.joint}:${i}`, joint: v.joint, path, pulled, text: unit ? `${magnitude} ${unit}` : magnitude, label: arrowLabelPosition(path, pulled) });
  });
  return out;
}

/**
 * Labels sit past the free end of a vertical arrow (where nothing else is
 * drawn) and above the shaft of a horizontal one (where a long label has room).
 */
export function arrowLabelPosition(path: ArrowPath, pulled = false): LabelPosition {
  const { tail, tip, unit } = path;
  if (Math.abs(unit.y) >= Math.abs(unit.x)) {
    const end = pulled ? tip : tail;
    const out = pulled ? unit : { x: -unit.x, y: -unit.y };
    return { x: end.x + out.x * 8, y: end.y + out.y * 8, anchor: "middle" };
  }
  return { x: (tail.x + tip.x) / 2, y: (tail.y + tip.y) / 2 - 8, anchor: "middle" };
}
