import { cross } from "../geometry/cross";
import { findLoadCase } from "../geometry/find-load-case";
import { indexJoints } from "../geometry/index-joints";
import { memberAxis, type MemberAxis } from "../geometry/member-axis";
import { PARALLEL_TOLERANCE } from "../geometry/parallel-tolerance";
import { validateTruss } from "../truss";
import type { TrussModel } from "../types";

/** Which load case decides whether a joint is loaded. */
export type ZeroForceMembersOptions = { loadCase: string };

/** A member shown to carry no force by inspection, with the rule and the joint that show it. */
export type ZeroForceMember = {
  member: string;
  /** 1: two non-collinear members at an unloaded, unsupported joint; 2: three members, two collinear. */
  rule: 1 | 2;
  joint: string;
  /** The rule in words, applied to this joint. */
  description: string;
};

/**
 * Zero-force members by inspection, repeated until nothing changes: once a
 * member is known to be zero it is taken out, and the joints at its ends may
 * then fall under a rule themselves.
 */
export function zeroForceMembers(model: TrussModel, options: ZeroForceMembersOptions): ZeroForceMember[] {
  const clean = validateTruss(model);
  const loadCase = findLoadCase(clean, options.loadCase);
  const joints = indexJoints(clean);
  const loaded = new Set(loadCase.loads.filter((l) => (l.fx ?? 0) !== 0 || (l.fy ?? 0) !== 0).map((l) => l.joint));
  const supported = new Set(clean.supports.map((s) => s.joint));
  const zero = new Map<string, ZeroForceMember>();
  let changed = true;
  while (changed) {
    changed = false;
    for (const j of clean.joints) {
      if (loaded.has(j.id) || supported.has(j.id)) continue;
      const active = clean.members.filter((m) => (m.start === j.id || m.end === j.id) && !zero.has(m.id)).map((m) => ({ id: m.id, axis: memberAxis(joints, m, j.id) }));
      for (const found of applyRules(j.id, active)) {
        zero.set(found.member, found);
        changed = true;
      }
    }
  }
  return [...zero.values()];
}

/** A member still in play at the joint, seen from it. */
type Active = { id: string; axis: MemberAxis };

function applyRules(joint: string, active: Active[]): ZeroForceMember[] {
  const ids = (a: Active) => a.id;
  if (active.length === 1) {
    // What is left after earlier zeros: a lone member cannot be balanced by anything.
    return [{ member: ids(active[0]), rule: 1, joint, description: `Joint ${joint} is unloaded and unsupported and ${ids(active[0])} is the only member left there with any force, so it carries none.` }];
  }
  if (active.length === 2 && !collinear(active[0], active[1])) {
    const text = `Joint ${joint} is unloaded and unsupported with two members, ${ids(active[0])} and ${ids(active[1])}, not on one line: neither force can be balanced, so both are zero.`;
    return active.map((a) => ({ member: ids(a), rule: 1 as const, joint, description: text }));
  }
  if (active.length === 3) {
    for (let k = 0; k < 3; k++) {
      const [p, q] = active.filter((_, i) => i !== k);
      if (collinear(p, q) && !collinear(p, active[k])) {
        return [{
          member: ids(active[k]), rule: 2, joint,
          description: `Joint ${joint} is unloaded and unsupported with three members; ${ids(p)} and ${ids(q)} are on one line, so nothing balances the third, ${ids(active[k])}, across it: it is zero.`,
        }];
      }
    }
  }
  return [];
}

/** Two members leaving a joint along one straight line (validation has ruled out overlapping members). */
function collinear(a: Active, b: Active): boolean {
  return Math.abs(cross(a.axis.direction, b.axis.direction)) < PARALLEL_TOLERANCE;
}
