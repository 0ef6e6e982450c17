import { isSolveError, zeroForceMembers, type TrussModel, type ZeroForceMember } from "@/lib/solve";

export type ZeroForceInspection = { members: ZeroForceMember[]; problem: string | null };

/**
 * Zero-force members by inspection for one case, from the core's two rules
 * applied until nothing changes; a case the truss does not have comes back
 * as words rather than as an error thrown into the editor.
 */
export function zeroForceInspection(model: TrussModel, loadCase: string): ZeroForceInspection {
  try {
    return { members: zeroForceMembers(model, { loadCase }), problem: null };
  } catch (e) {
    if (!isSolveError(e)) throw e;
    return { members: [], problem: e.message };
  }
}

/** The rule in a few words, for the list's first column. */
export function zeroForceRuleName(rule: 1 | 2): string {
  return rule === 1 ? "Rule 1: two members not in line at an unloaded joint" : "Rule 2: three members, two in line, at an unloaded joint";
}
