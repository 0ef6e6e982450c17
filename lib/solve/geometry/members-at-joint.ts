import type { Member, TrussModel } from "../types";

/** The members framing into a joint, in model order. */
export function membersAtJoint(model: TrussModel, joint: string): Member[] {
  return model.members.filter((m) => m.start === joint || m.end === joint);
}
