import type { CaseResult, LoadCase } from "../types";

/**
 * The largest load or reaction component in a case. Comparisons of member
 * forces are relative to at least this, so a member that is zero by statics
 * and 1e-13 by the stiffness solver still agrees.
 */
export function forceScale(loadCase: LoadCase, result: CaseResult): number {
  let scale = 0;
  for (const l of loadCase.loads) scale = Math.max(scale, Math.abs(l.fx ?? 0), Math.abs(l.fy ?? 0));
  for (const r of Object.values(result.reactions)) scale = Math.max(scale, Math.abs(r.rx), Math.abs(r.ry));
  return scale;
}
