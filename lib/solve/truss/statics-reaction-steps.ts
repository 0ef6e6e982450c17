import { escapeTex, texQty } from "../latex";
import type { Step, TrussModel } from "../types";
import { cleanRoundOff } from "./clean-round-off";
import { indexTruss } from "./index-truss";
import { forceTerms, momentTerms, plainNumber, reactionSymbol, type LoadPoint, type StepUnits } from "./reaction-terms";
import { termTotal, texSum, type TexTerm } from "./tex-sum";

/** The pin and the roller of a truss on one of each. */
export type PinAndRoller = { pin: string; roller: string; direction: [number, number] };

/**
 * Reactions of a truss on one pin and one roller by statics alone: ΣM about
 * the pin leaves the roller's reaction as the only unknown, then ΣFx and
 * ΣFy give the pin's two components. Null when the roller's line passes
 * through the pin (the truss would be unstable, so the caller has not let it
 * get here, but the arithmetic must not divide by zero).
 */
export function staticsReactionSteps(model: TrussModel, supports: PinAndRoller, points: LoadPoint[], u: StepUnits): Step[] | null {
  const { jointIndex } = indexTruss(model);
  const A = model.joints[jointIndex.get(supports.pin) ?? -1];
  const B = model.joints[jointIndex.get(supports.roller) ?? -1];
  if (!A || !B) return null;
  const [d0, d1] = supports.direction;
  const nx = d0 / Math.hypot(d0, d1);
  const ny = d1 / Math.hypot(d0, d1);
  const dx = B.x - A.x;
  const dy = B.y - A.y;
  const arm = dx * ny - dy * nx;
  if (!(Math.abs(arm) > 1e-9 * Math.hypot(dx, dy))) return null;
  // A vertical or horizontal roller is written by its one component; an inclined one by R along n.
  const axis: "x" | "y" | undefined = nx === 0 ? "y" : ny === 0 ? "x" : undefined;
  const loadM = momentTerms(points, A.x, A.y, u, "load moments");
  // ΣM_A: R·arm + ΣM_loads = 0, R along the unit direction n.
  const R = -termTotal(loadM) / arm;
  const forceScale = points.reduce((m, p) => Math.max(m, Math.hypot(p.fx, p.fy)), 0);
  const clean = (v: number) => cleanRoundOff(v, forceScale);
  const unknown = reactionSymbol(B.id, axis);
  const shown = clean(axis === "y" ? R * ny : axis === "x" ? R * nx : R);
  const rollerTerm: TexTerm = axis === "x" ? { tex: `${unknown}\\,`, factors: [[dy, u.L]], sign: -1, value: R * nx * dy }
    : { tex: `${unknown}\\,`, factors: [[axis === "y" ? dx : arm, u.L]], sign: 1, value: R * arm };
  const found = axis === "y" ? `its vertical component is ${plainNumber(shown)} ${u.F}`
    : axis === "x" ? `its horizontal component is ${plainNumber(shown)} ${u.F}`
    : `it is ${plainNumber(shown)} ${u.F} along (${plainNumber(nx)}, ${plainNumber(ny)})`;
  const stepM: Step = {
    latex: `\\textstyle\\sum M_{\\mathrm{${escapeTex(A.id)}}} = 0:\\quad ${texSum([rollerTerm, ...loadM])} = 0\\;\\Rightarrow\\; ${unknown} = ${texQty(shown, u.F)}`,
    text: `Taking moments about the pin at ${A.id} (counter-clockwise positive) leaves the roller reaction at ${B.id} as the only unknown: ${found}.`,
  };
  const component = (value: number, cosine: number): TexTerm[] =>
    value === 0 ? [] : [{ factors: axis ? [[clean(value), u.F]] : [[clean(R), u.F], [cosine, ""]], sign: 1, value }];
  const sums = (comp: "x" | "y"): Step => {
    const roller = axis && axis !== comp ? [] : component(comp === "x" ? R * nx : R * ny, comp === "x" ? nx : ny);
    const loads = forceTerms(points, comp === "x" ? "fx" : "fy", u, "loads");
    const value = clean(-(termTotal(roller) + termTotal(loads)));
    const symbol = reactionSymbol(A.id, comp);
    return {
      latex: `\\textstyle\\sum F_${comp} = 0:\\quad ${texSum([{ tex: symbol, sign: 1, value: 0 }, ...roller, ...loads])} = 0\\;\\Rightarrow\\; ${symbol} = ${texQty(value, u.F)}`,
      text: `${comp === "x" ? "Horizontal" : "Vertical"} equilibrium gives the ${comp === "x" ? "horizontal" : "vertical"} reaction at ${A.id}: ${plainNumber(value)} ${u.F}.`,
    };
  };
  return [stepM, sums("x"), sums("y")];
}
