import { z } from "zod";
import { SolveError } from "../errors";
import type { JointLoad, TrussModel } from "../types";
import { finiteNumber } from "./finite-number";
import { invalidFromZod } from "./invalid-from-zod";

/** A uniform line load on a chord, to be lumped at its panel points. */
export type LineLoadToPanelLoadsOptions = {
  model: TrussModel;
  /** Joint ids along the chord, in order; each consecutive pair must be joined by a member. */
  chord: string[];
  /**
   * Intensity, force per length. Acts downward (positive w gives negative fy)
   * unless `direction` is given; a negative w reverses it (uplift).
   */
  w: number;
  /**
   * true (default): w is per horizontal projection, as for snow and roof live
   * load; false: per length along the members, as for self-weight or wind on a
   * sloped chord.
   */
  projected?: boolean;
  /** Line of action [dx, dy] (normalised here); the load is w along it. Default [0, −1]. */
  direction?: [number, number];
};

const schema = z.strictObject({
  model: z.custom<TrussModel>((m) => typeof m === "object" && m !== null && Array.isArray((m as TrussModel).joints), "must be a truss model"),
  chord: z.array(z.string().min(1, "must not be empty")).min(2, "needs at least two joints"),
  w: finiteNumber(),
  projected: z.boolean().optional(),
  direction: z
    .tuple([finiteNumber(), finiteNumber()])
    .refine(([dx, dy]) => Math.hypot(dx, dy) > 0, "must not be a zero vector")
    .optional(),
});

/**
 * Lumps a uniform line load on a chord into joint loads by tributary length:
 * each panel point takes half of each panel beside it, so the ends take half a
 * panel and the loads add up to w × (chord length). One load per chord joint,
 * in chord order.
 */
export function lineLoadToPanelLoads(options: LineLoadToPanelLoadsOptions): JointLoad[] {
  const parsed = schema.safeParse(options);
  if (!parsed.success) throw invalidFromZod(parsed.error, "line load");
  const { model, chord, w, projected = true, direction } = parsed.data;
  const points = chord.map((id, i) => {
    const joint = model.joints.find((j) => j.id === id);
    if (!joint) throw new SolveError("INVALID", `line load: chord joint ${id} is not in the model`, { path: `chord[${i}]` });
    return joint;
  });
  const tributary = points.map(() => 0);
  for (let i = 1; i < points.length; i++) {
    const [a, b] = [points[i - 1], points[i]];
    const joined = model.members.some((m) => (m.start === a.id && m.end === b.id) || (m.start === b.id && m.end === a.id));
    if (!joined) throw new SolveError("INVALID", `line load: no member joins chord joints ${a.id} and ${b.id}`, { path: `chord[${i}]` });
    const length = projected ? Math.abs(b.x - a.x) : Math.hypot(b.x - a.x, b.y - a.y);
    tributary[i - 1] += length / 2;
    tributary[i] += length / 2;
  }
  const [ux, uy] = unit(direction ?? [0, -1]);
  return points.map((p, i) => {
    const force = w * tributary[i];
    // Without a direction the load is purely vertical; leave fx out rather than write a zero.
    return direction ? { joint: p.id, fx: plusZero(force * ux), fy: plusZero(force * uy) } : { joint: p.id, fy: plusZero(force * uy) };
  });
}

function unit([dx, dy]: [number, number]): [number, number] {
  const length = Math.hypot(dx, dy);
  return [dx / length, dy / length];
}

// −0 would print as "-0" in tables and steps; a load of zero has no sign.
function plusZero(v: number): number {
  return v === 0 ? 0 : v;
}
