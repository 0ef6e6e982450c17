import type { JointLoad, Reaction, Support } from "@/lib/solve";

/** A force to draw as one arrow at a joint, in model axes (y up). */
export type ForceVector = { joint: string; fx: number; fy: number };

/**
 * Loads summed per joint and split into their x and y components, one arrow
 * each: engineers read and check loads by component, and a summed load avoids
 * stacking arrows on a joint that appears twice in the list.
 */
export function jointLoadVectors(loads: readonly JointLoad[]): ForceVector[] {
  const sums = new Map<string, { fx: number; fy: number }>();
  for (const l of loads) {
    const s = sums.get(l.joint) ?? { fx: 0, fy: 0 };
    s.fx += finite(l.fx);
    s.fy += finite(l.fy);
    sums.set(l.joint, s);
  }
  const out: ForceVector[] = [];
  for (const [joint, s] of sums) {
    if (s.fx !== 0) out.push({ joint, fx: s.fx, fy: 0 });
    if (s.fy !== 0) out.push({ joint, fx: 0, fy: s.fy });
  }
  return out;
}

/**
 * Reactions as arrows: components for pins and for rollers square to the axes,
 * one resultant along the line of an inclined roller (its only reaction).
 */
export function reactionVectors(supports: readonly Support[], reactions: Record<string, Reaction> | undefined): ForceVector[] {
  if (!reactions) return [];
  const out: ForceVector[] = [];
  for (const s of supports) {
    const r = reactions[s.joint];
    if (!r) continue;
    const rx = finite(r.rx);
    const ry = finite(r.ry);
    const inclined = s.type === "roller" && s.direction !== undefined && s.direction[0] !== 0 && s.direction[1] !== 0;
    if (inclined) {
      if (rx !== 0 || ry !== 0) out.push({ joint: s.joint, fx: rx, fy: ry });
      continue;
    }
    if (rx !== 0) out.push({ joint: s.joint, fx: rx, fy: 0 });
    if (ry !== 0) out.push({ joint: s.joint, fx: 0, fy: ry });
  }
  return out;
}

function finite(v: number | undefined): number {
  return v !== undefined && Number.isFinite(v) ? v : 0;
}
