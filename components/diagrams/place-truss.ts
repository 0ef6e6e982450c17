import type { Joint, TrussModel } from "@/lib/solve";
import { fitViewBox, type FitViewBoxOptions, type Point, type ViewBox } from "./fit-view-box";

export type PlacedJoint = { id: string; at: Point; joint: Joint };
export type PlacedMember = { id: string; start: string; end: string; a: Point; b: Point };

export type PlacedTruss = {
  view: ViewBox;
  /** Joints by id, in SVG coordinates; the first of a repeated id wins. */
  joints: Map<string, PlacedJoint>;
  members: PlacedMember[];
  /** Members that cannot be drawn: a missing or unplaceable joint, or both ends at one point. */
  skippedMembers: string[];
};

export type PlaceTrussOptions = Omit<FitViewBoxOptions, "points">;

/**
 * Places a model's joints and members in SVG coordinates. It never throws: the
 * diagram is drawn while the engineer types, so half-entered input is skipped
 * here and reported by validation on the field that is wrong.
 */
export function placeTruss(model: TrussModel, options: PlaceTrussOptions = {}): PlacedTruss {
  const usable = (model.joints ?? []).filter((j) => Number.isFinite(j.x) && Number.isFinite(j.y));
  const view = fitViewBox({ ...options, points: usable });
  const joints = new Map<string, PlacedJoint>();
  for (const j of usable) {
    if (!joints.has(j.id)) joints.set(j.id, { id: j.id, at: view.toSvg(j), joint: j });
  }

  const members: PlacedMember[] = [];
  const skippedMembers: string[] = [];
  for (const m of model.members ?? []) {
    const s = joints.get(m.start);
    const e = joints.get(m.end);
    if (!s || !e || (s.joint.x === e.joint.x && s.joint.y === e.joint.y)) {
      skippedMembers.push(m.id);
      continue;
    }
    members.push({ id: m.id, start: m.start, end: m.end, a: s.at, b: e.at });
  }
  return { view, joints, members, skippedMembers };
}
