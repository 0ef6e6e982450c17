import { escapeTex, texQty } from "../latex";
import type { LoadCase, Reaction, Step, TrussModel } from "../types";
import { cleanRoundOff } from "./clean-round-off";
import { indexTruss } from "./index-truss";
import { MAX_WRITTEN_TERMS, termTotal, texFactor, texSum, type TexTerm } from "./tex-sum";

type Units = { L: string; F: string; M: string };
type Point = { id: string; x: number; y: number; fx: number; fy: number };

/**
 * The global-equilibrium working for the reactions of one load case: ΣM about
 * a support, ΣFx and ΣFy, with the numbers in. With one pin and one roller
 * the three equations are solved in turn (statics alone); with any other
 * support layout the reactions come from the stiffness solution and the
 * equations are written as a check that sums to zero.
 */
export function reactionSteps(model: TrussModel, loadCase: LoadCase, reactions: Record<string, Reaction>): Step[] {
  const L = model.units?.length ?? "m";
  const F = model.units?.force ?? "kN";
  const units: Units = { L, F, M: `${F}*${L}` };
  const points = loadPoints(model, loadCase);
  const pins = model.supports.filter((s) => s.type === "pin");
  const rollers = model.supports.filter((s) => s.type === "roller");
  if (pins.length === 1 && rollers.length === 1) {
    const solved = solvedSteps(model, pins[0].joint, rollers[0].joint, rollers[0].direction ?? [0, 1], points, units);
    if (solved) return solved;
  }
  return checkSteps(model, points, reactions, units);
}

function loadPoints(model: TrussModel, loadCase: LoadCase): Point[] {
  const { jointIndex } = indexTruss(model);
  const byJoint = new Map<string, Point>();
  for (const load of loadCase.loads) {
    const joint = model.joints[jointIndex.get(load.joint) ?? -1];
    if (!joint) continue;
    const p = byJoint.get(joint.id) ?? { id: joint.id, x: joint.x, y: joint.y, fx: 0, fy: 0 };
    p.fx += load.fx ?? 0;
    p.fy += load.fy ?? 0;
    byJoint.set(joint.id, p);
  }
  return [...byJoint.values()].filter((p) => p.fx !== 0 || p.fy !== 0);
}

/** R with a joint id and component as its subscript, e.g. R_{B,y}. */
function sym(id: string, comp?: "x" | "y"): string {
  return `R_{\\mathrm{${escapeTex(id)}}${comp ? `,${comp}` : ""}}`;
}

const q = texFactor;

/** Moment terms of the loads about (x0, y0), counter-clockwise positive; collapsed to a total when there are many. */
function loadMoments(points: Point[], x0: number, y0: number, u: Units): TexTerm[] {
  const terms: TexTerm[] = [];
  for (const p of points) {
    const dx = p.x - x0;
    const dy = p.y - y0;
    if (p.fy !== 0 && dx !== 0) terms.push({ factors: [[p.fy, u.F], [dx, u.L]], sign: 1, value: p.fy * dx });
    if (p.fx !== 0 && dy !== 0) terms.push({ factors: [[p.fx, u.F], [dy, u.L]], sign: -1, value: p.fx * dy });
  }
  return collapse(terms, u.M, "load moments");
}

function loadForces(points: Point[], comp: "fx" | "fy", u: Units): TexTerm[] {
  const terms = points.filter((p) => p[comp] !== 0).map((p): TexTerm => ({ factors: [[p[comp], u.F]], sign: 1, value: p[comp] }));
  return collapse(terms, u.F, "loads");
}

function collapse(terms: TexTerm[], unit: string, what: string): TexTerm[] {
  if (terms.length <= MAX_WRITTEN_TERMS) return terms;
  const total = termTotal(terms);
  return [{ tex: `\\underbrace{${q(total, unit)}}_{\\text{${terms.length} ${what}}}`, sign: 1, value: total }];
}

function solvedSteps(model: TrussModel, pinId: string, rollerId: string, dir: [number, number], points: Point[], u: Units): Step[] | null {
  const { jointIndex } = indexTruss(model);
  const A = model.joints[jointIndex.get(pinId) ?? -1];
  const B = model.joints[jointIndex.get(rollerId) ?? -1];
  if (!A || !B) return null;
  const len = Math.hypot(dir[0], dir[1]);
  const nx = dir[0] / len;
  const ny = dir[1] / len;
  const dx = B.x - A.x;
  const dy = B.y - A.y;
  const arm = dx * ny - dy * nx;
  const extent = Math.hypot(dx, dy);
  if (!(Math.abs(arm) > 1e-9 * extent)) return null;
  const axis: "x" | "y" | undefined = nx === 0 ? "y" : ny === 0 ? "x" : undefined;
  const loadM = loadMoments(points, A.x, A.y, u);
  const sumM = termTotal(loadM);
  // R is the roller reaction along its unit direction n; ΣM_A: R·arm + ΣM_loads = 0.
  const R = -sumM / arm;
  const RBx = R * nx;
  const RBy = R * ny;
  const unknown = axis ? sym(B.id, axis) : sym(B.id);
  const shown = axis === "y" ? RBy : axis === "x" ? RBx : R;
  const rollerTerm: TexTerm = axis === "y" ? { tex: `${unknown}\\,`, factors: [[dx, u.L]], sign: 1, value: RBy * dx }
    : axis === "x" ? { tex: `${unknown}\\,`, factors: [[dy, u.L]], sign: -1, value: RBx * dy }
    : { tex: `${unknown}\\,`, factors: [[arm, u.L]], sign: 1, value: R * arm };
  const forceScale = points.reduce((m, p) => Math.max(m, Math.hypot(p.fx, p.fy)), 0);
  const clean = (v: number) => cleanRoundOff(v, forceScale);
  const found = axis === "y" ? `its vertical component is ${plain(clean(shown))} ${u.F}`
    : axis === "x" ? `its horizontal component is ${plain(clean(shown))} ${u.F}`
    : `it is ${plain(clean(shown))} ${u.F} along (${plain(nx)}, ${plain(ny)})`;
  const stepM: Step = {
    latex: `\\textstyle\\sum M_{\\mathrm{${escapeTex(A.id)}}} = 0:\\quad ${texSum([rollerTerm, ...loadM])} = 0\\;\\Rightarrow\\; ${unknown} = ${texQty(clean(shown), u.F)}`,
    text: `Taking moments about the pin at ${A.id} (counter-clockwise positive) leaves the roller reaction at ${B.id} as the only unknown: ${found}.`,
  };
  const fxTerms = loadForces(points, "fx", u);
  const fyTerms = loadForces(points, "fy", u);
  const rollerX: TexTerm[] = axis === "y" || RBx === 0 ? [] : [{ factors: [[clean(RBx), u.F]], sign: 1, value: RBx }];
  const rollerY: TexTerm[] = axis === "x" || RBy === 0 ? [] : [{ factors: [[clean(RBy), u.F]], sign: 1, value: RBy }];
  const RAx = clean(-(termTotal(rollerX) + termTotal(fxTerms)));
  const RAy = clean(-(termTotal(rollerY) + termTotal(fyTerms)));
  const ax = sym(A.id, "x");
  const ay = sym(A.id, "y");
  const stepX: Step = {
    latex: `\\textstyle\\sum F_x = 0:\\quad ${texSum([{ tex: ax, sign: 1, value: 0 }, ...rollerX, ...fxTerms])} = 0\\;\\Rightarrow\\; ${ax} = ${texQty(RAx, u.F)}`,
    text: `Horizontal equilibrium gives the horizontal reaction at ${A.id}: ${plain(RAx)} ${u.F}.`,
  };
  const stepY: Step = {
    latex: `\\textstyle\\sum F_y = 0:\\quad ${texSum([{ tex: ay, sign: 1, value: 0 }, ...rollerY, ...fyTerms])} = 0\\;\\Rightarrow\\; ${ay} = ${texQty(RAy, u.F)}`,
    text: `Vertical equilibrium gives the vertical reaction at ${A.id}: ${plain(RAy)} ${u.F}.`,
  };
  return [stepM, stepX, stepY];
}

function checkSteps(model: TrussModel, points: Point[], reactions: Record<string, Reaction>, u: Units): Step[] {
  const { jointIndex } = indexTruss(model);
  const supports = model.supports.map((s) => model.joints[jointIndex.get(s.joint) ?? -1]).filter((j) => j !== undefined);
  const O = supports[0];
  const react = supports.map((j) => ({ id: j.id, x: j.x, y: j.y, ...(reactions[j.id] ?? { rx: 0, ry: 0 }) }));
  const mTerms: TexTerm[] = [];
  for (const r of react) {
    const dx = r.x - O.x;
    const dy = r.y - O.y;
    if (r.ry !== 0 && dx !== 0) mTerms.push({ factors: [[r.ry, u.F], [dx, u.L]], sign: 1, value: r.ry * dx });
    if (r.rx !== 0 && dy !== 0) mTerms.push({ factors: [[r.rx, u.F], [dy, u.L]], sign: -1, value: r.rx * dy });
  }
  const reactionM = collapse(mTerms, u.M, "reaction moments");
  const moment = [...reactionM, ...loadMoments(points, O.x, O.y, u)];
  const fx = [...collapse(react.filter((r) => r.rx !== 0).map((r): TexTerm => ({ factors: [[r.rx, u.F]], sign: 1, value: r.rx })), u.F, "reactions"), ...loadForces(points, "fx", u)];
  const fy = [...collapse(react.filter((r) => r.ry !== 0).map((r): TexTerm => ({ factors: [[r.ry, u.F]], sign: 1, value: r.ry })), u.F, "reactions"), ...loadForces(points, "fy", u)];
  const residual = (terms: TexTerm[], unit: string) => texQty(cleanRoundOff(termTotal(terms), terms.reduce((m, t) => Math.max(m, Math.abs(t.value)), 0)), unit);
  const layout = `The ${supports.length} supports (${model.supports.map((s) => `${s.type} at ${s.joint}`).join(", ")}) are not one pin and one roller, so the reactions come from the stiffness solution`;
  return [
    {
      latex: `\\textstyle\\sum M_{\\mathrm{${escapeTex(O.id)}}}:\\quad ${texSum(moment)} = ${residual(moment, u.M)}`,
      text: `${layout}; moments about ${O.id} (counter-clockwise positive) check them.`,
    },
    { latex: `\\textstyle\\sum F_x:\\quad ${texSum(fx)} = ${residual(fx, u.F)}`, text: "The horizontal reactions balance the horizontal loads." },
    { latex: `\\textstyle\\sum F_y:\\quad ${texSum(fy)} = ${residual(fy, u.F)}`, text: "The vertical reactions balance the vertical loads." },
  ];
}

/** A number for running text: four significant figures, no exponent markup. */
function plain(v: number): string {
  const r = Number(v.toPrecision(4));
  return String(r === 0 ? 0 : r);
}
