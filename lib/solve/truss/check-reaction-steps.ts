import { escapeTex, texQty } from "../latex";
import type { Reaction, Step, TrussModel } from "../types";
import { cleanRoundOff } from "./clean-round-off";
import { indexTruss } from "./index-truss";
import { forceTerms, momentTerms, type LoadPoint, type StepUnits } from "./reaction-terms";
import { termTotal, texSum, type TexTerm } from "./tex-sum";

/**
 * Global equilibrium as a check of reactions found by the stiffness method,
 * for support layouts statics alone cannot solve: ΣM about the first
 * support, ΣFx and ΣFy, each with every reaction and load substituted,
 * summing to zero.
 */
export function checkReactionSteps(model: TrussModel, points: LoadPoint[], reactions: Record<string, Reaction>, u: StepUnits): Step[] {
  const { jointIndex } = indexTruss(model);
  const supports: LoadPoint[] = model.supports.map((s) => {
    const j = model.joints[jointIndex.get(s.joint) ?? 0];
    const r = reactions[s.joint] ?? { rx: 0, ry: 0 };
    return { id: j.id, x: j.x, y: j.y, fx: r.rx, fy: r.ry };
  });
  const O = supports[0];
  const moment = [...momentTerms(supports, O.x, O.y, u, "reaction moments"), ...momentTerms(points, O.x, O.y, u, "load moments")];
  const fx = [...forceTerms(supports, "fx", u, "reactions"), ...forceTerms(points, "fx", u, "loads")];
  const fy = [...forceTerms(supports, "fy", u, "reactions"), ...forceTerms(points, "fy", u, "loads")];
  // The sums are zero to round-off; shown cleaned against their largest addend.
  const residual = (terms: TexTerm[], unit: string) => texQty(cleanRoundOff(termTotal(terms), terms.reduce((m, t) => Math.max(m, Math.abs(t.value)), 0)), unit);
  const layout = model.supports.map((s) => `${s.type} at ${s.joint}`).join(", ");
  return [
    {
      latex: `\\textstyle\\sum M_{\\mathrm{${escapeTex(O.id)}}}:\\quad ${texSum(moment)} = ${residual(moment, u.M)}`,
      text: `The supports (${layout}) are not one pin and one roller, so the reactions come from the stiffness solution; moments about ${O.id} (counter-clockwise positive) check them.`,
    },
    { latex: `\\textstyle\\sum F_x:\\quad ${texSum(fx)} = ${residual(fx, u.F)}`, text: "The horizontal reactions balance the horizontal loads." },
    { latex: `\\textstyle\\sum F_y:\\quad ${texSum(fy)} = ${residual(fy, u.F)}`, text: "The vertical reactions balance the vertical loads." },
  ];
}
