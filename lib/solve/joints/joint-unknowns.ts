import { cross } from "../geometry/cross";
import { memberAxis, type MemberAxis } from "../geometry/member-axis";
import { membersAtJoint } from "../geometry/members-at-joint";
import { PARALLEL_TOLERANCE } from "../geometry/parallel-tolerance";
import type { JointContext } from "./joint-context";

/** The members at a joint split into those already known and those still to find, each seen from the joint. */
export type JointMembers = {
  known: Array<{ id: string; axis: MemberAxis; force: number }>;
  unknown: Array<{ id: string; axis: MemberAxis }>;
  /** True when there are two unknowns on one line, which ΣFx and ΣFy cannot separate. */
  collinear: boolean;
};

/** Sorts a joint's members into known and unknown given the forces found so far. */
export function jointUnknowns(ctx: JointContext, joint: string, known: Record<string, number>): JointMembers {
  const out: JointMembers = { known: [], unknown: [], collinear: false };
  for (const m of membersAtJoint(ctx.model, joint)) {
    const axis = memberAxis(ctx.joints, m, joint);
    if (Object.hasOwn(known, m.id)) out.known.push({ id: m.id, axis, force: known[m.id] });
    else out.unknown.push({ id: m.id, axis });
  }
  if (out.unknown.length === 2) {
    out.collinear = Math.abs(cross(out.unknown[0].axis.direction, out.unknown[1].axis.direction)) < PARALLEL_TOLERANCE;
  }
  return out;
}
