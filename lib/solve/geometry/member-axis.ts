import { SolveError } from "../errors";
import type { Joint, Member } from "../types";
import type { Point } from "./types";

/** A member seen from one of its ends. */
export type MemberAxis = {
  /** The end the member is seen from. */
  from: string;
  /** The other end. */
  to: string;
  /** Coordinates of `from`. */
  point: Point;
  /** Unit vector from `from` towards `to`: the direction a tension force pulls on `from`. */
  direction: Point;
  length: number;
};

/**
 * The axis of a member seen from `from`. Tension pulls each end towards the
 * other, so `direction` is the line of action of an assumed-tension force on
 * the joint (or free body) at `from`.
 */
export function memberAxis(joints: Map<string, Joint>, member: Member, from: string): MemberAxis {
  if (from !== member.start && from !== member.end) {
    throw new SolveError("INVALID", `Joint ${from} is not an end of member ${member.id}.`);
  }
  const to = from === member.start ? member.end : member.start;
  const a = joints.get(from);
  const b = joints.get(to);
  if (!a || !b) {
    throw new SolveError("INVALID", `Member ${member.id} refers to a joint that does not exist.`);
  }
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const length = Math.hypot(dx, dy);
  if (!(length > 0)) {
    throw new SolveError("INVALID", `Member ${member.id} has zero length.`);
  }
  return { from, to, point: { x: a.x, y: a.y }, direction: { x: dx / length, y: dy / length }, length };
}
