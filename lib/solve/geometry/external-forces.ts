import type { CaseResult, LoadCase } from "../types";
import type { ExternalForce } from "./types";

/**
 * The loads and reactions acting on a set of joints, one entry per load line
 * and per support joint, in model order. Zero entries are left out so the
 * working does not list forces that are not there.
 */
export function externalForces(loadCase: LoadCase, result: CaseResult, joints: ReadonlySet<string>): ExternalForce[] {
  const out: ExternalForce[] = [];
  for (const load of loadCase.loads) {
    const fx = load.fx ?? 0;
    const fy = load.fy ?? 0;
    if (joints.has(load.joint) && (fx !== 0 || fy !== 0)) out.push({ joint: load.joint, kind: "load", fx, fy });
  }
  for (const [joint, r] of Object.entries(result.reactions)) {
    if (joints.has(joint) && (r.rx !== 0 || r.ry !== 0)) out.push({ joint, kind: "reaction", fx: r.rx, fy: r.ry });
  }
  return out;
}
