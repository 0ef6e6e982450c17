import { SolveError } from "../errors";
import type { TrussModel } from "../types";
import type { TrussIndex } from "./index-truss";

/**
 * Throws INVALID at the first broken cross-reference, in the order an
 * engineer reads the model: joints, members, supports, load cases.
 */
export function checkReferences(model: TrussModel, index: TrussIndex): void {
  const { jointIndex } = index;
  if (jointIndex.size < model.joints.length) {
    // Fewer distinct ids than joints: some id repeats; find the first repeat.
    const seen = new Set<string>();
    model.joints.forEach((joint, i) => {
      if (seen.has(joint.id)) fail(`joints[${i}].id`, `Joint id "${joint.id}" is used twice; each joint needs its own id.`);
      seen.add(joint.id);
    });
  }

  const members = new Set<string>();
  for (let i = 0; i < model.members.length; i++) {
    const member = model.members[i];
    if (members.has(member.id)) fail(`members[${i}].id`, `Member id "${member.id}" is used twice; each member needs its own id.`);
    members.add(member.id);
    if (index.start[i] < 0) fail(`members[${i}].start`, `Member ${member.id} starts at joint "${member.start}", which does not exist.`);
    if (index.end[i] < 0) fail(`members[${i}].end`, `Member ${member.id} ends at joint "${member.end}", which does not exist.`);
    if (member.start === member.end) fail(`members[${i}].end`, `Member ${member.id} starts and ends at the same joint ${member.start}.`);
  }

  const supported = new Set<string>();
  model.supports.forEach((support, i) => {
    if (!jointIndex.has(support.joint)) fail(`supports[${i}].joint`, `Support ${i + 1} is on joint "${support.joint}", which does not exist.`);
    if (supported.has(support.joint)) fail(`supports[${i}].joint`, `Joint ${support.joint} has two supports; combine them into one (a pin restrains both directions).`);
    supported.add(support.joint);
    const d = support.direction;
    if (support.type === "roller" && d && Math.hypot(d[0], d[1]) === 0) {
      fail(`supports[${i}].direction`, `The roller at joint ${support.joint} has a zero direction; give the line of its reaction, e.g. [0, 1] for vertical.`);
    }
  });

  const cases = new Set<string>();
  model.loadCases.forEach((loadCase, c) => {
    if (cases.has(loadCase.id)) fail(`loadCases[${c}].id`, `Load case id "${loadCase.id}" is used twice; each load case needs its own id.`);
    cases.add(loadCase.id);
    for (let k = 0; k < loadCase.loads.length; k++) {
      const load = loadCase.loads[k];
      if (!jointIndex.has(load.joint)) fail(`loadCases[${c}].loads[${k}].joint`, `Load ${k + 1} of case ${loadCase.id} is on joint "${load.joint}", which does not exist.`);
    }
  });
}

function fail(path: string, message: string): never {
  throw new SolveError("INVALID", message, { path });
}
