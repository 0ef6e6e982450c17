/** A section cuts two or three members: more cannot be solved one equation per member. */
export const MAX_CUT_MEMBERS = 3;

/**
 * The cut after the author clicks a member: a cut member comes out; a new
 * one goes in, and once three are cut the earliest pick makes room, so the
 * author can walk a section across the truss one click at a time.
 */
export function toggleCutMember(members: readonly string[], member: string): string[] {
  if (members.includes(member)) return members.filter((m) => m !== member);
  const kept = members.length >= MAX_CUT_MEMBERS ? members.slice(members.length - MAX_CUT_MEMBERS + 1) : members;
  return [...kept, member];
}
