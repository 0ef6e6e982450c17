import { SolveError } from "../errors";
import { memberAxis } from "../geometry/member-axis";
import type { Joint, TrussModel } from "../types";
import type { CutMember } from "./cut-member";
import { splitByCut } from "./split-by-cut";

/** The two sides of a valid cut and the cut members seen from the kept side. */
export type ResolvedCut = { keptJoints: string[]; otherJoints: string[]; cut: CutMember[] };

/**
 * Checks the cut the engineer asked for and finds its free body. Bad input
 * (unknown ids, repeats) is INVALID with a path; a cut that cannot be solved
 * by a section is UNSOLVABLE_CUT with the reason in words.
 */
export function resolveCut(model: TrussModel, joints: Map<string, Joint>, members: string[], keep: string): ResolvedCut {
  if (!Array.isArray(members) || members.length === 0) {
    throw new SolveError("INVALID", "Name the members the section cuts.", { path: "members" });
  }
  const seen = new Set<string>();
  members.forEach((id, i) => {
    if (seen.has(id)) throw new SolveError("INVALID", `Member ${id} is listed twice in the cut.`, { path: `members[${i}]` });
    if (!model.members.some((m) => m.id === id)) {
      throw new SolveError("INVALID", `Member ${id} is not in the truss.`, { path: `members[${i}]` });
    }
    seen.add(id);
  });
  if (!joints.has(keep)) {
    throw new SolveError("INVALID", `Joint ${keep} (the side to keep) is not in the truss.`, { path: "keep" });
  }
  if (members.length > 3) {
    throw new SolveError(
      "UNSOLVABLE_CUT",
      `The section cuts ${members.length} members: more than the three unknowns a free body's three equilibrium equations can find.`,
    );
  }
  if (members.length < 2) {
    throw new SolveError("UNSOLVABLE_CUT", "A section must cut two or three members; one member alone cannot be separated by a section.");
  }
  const split = splitByCut(model, members);
  if (!split.ok) throw new SolveError("UNSOLVABLE_CUT", split.reason);
  const [a, b] = split.sides;
  const keptJoints = a.includes(keep) ? a : b;
  const otherJoints = keptJoints === a ? b : a;
  const kept = new Set(keptJoints);
  const cut = members.map((id) => {
    const member = model.members.find((m) => m.id === id);
    if (!member) throw new SolveError("INVALID", `Member ${id} is not in the truss.`, { path: "members" });
    return { id, axis: memberAxis(joints, member, kept.has(member.start) ? member.start : member.end) };
  });
  return { keptJoints, otherJoints, cut };
}
