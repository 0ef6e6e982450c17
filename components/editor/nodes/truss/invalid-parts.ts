import type { CalcFieldError } from "@/lib/calcs/calc-types";
import type { TrussDraft } from "./truss-draft";

/** Joints and members the diagram marks as wrong. */
export type InvalidParts = { joints: string[]; members: string[] };

const AT = /^(joints|members|supports)\[(\d+)\]/;
const LOAD = /^loadCases\[(\d+)\]\.loads\[(\d+)\]/;

/**
 * Which drawn parts the field errors are about: a joint or member row named
 * by its id, a support by its joint, a load by the joint it is put on. A
 * member whose end is the problem is the member to mark, not the joint.
 */
export function invalidParts(errors: readonly CalcFieldError[], draft: TrussDraft): InvalidParts {
  const joints = new Set<string>();
  const members = new Set<string>();
  for (const e of errors) {
    const at = AT.exec(e.path);
    if (at) {
      const i = Number(at[2]);
      if (at[1] === "joints" && draft.joints[i]) joints.add(draft.joints[i].id);
      if (at[1] === "members" && draft.members[i]) members.add(draft.members[i].id);
      if (at[1] === "supports" && draft.supports[i]) joints.add(draft.supports[i].joint);
      continue;
    }
    const load = LOAD.exec(e.path);
    const joint = load ? draft.loadCases[Number(load[1])]?.loads[Number(load[2])]?.joint : undefined;
    if (joint) joints.add(joint);
  }
  return { joints: [...joints], members: [...members] };
}
