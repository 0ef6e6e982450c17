import { escapeTex } from "../latex";
import type { TrussModel } from "../types";
import type { JointLoadTotals } from "./joint-loads";
import { MAX_WRITTEN_TERMS, termTotal, texFactor, type TexTerm } from "./tex-sum";

/** Unit names for typeset steps: length, force and moment (`kN*m` style). */
export type StepUnits = { L: string; F: string; M: string };
/** A loaded joint: where it is and its total load. */
export type LoadPoint = { id: string; x: number; y: number; fx: number; fy: number };

/** The model's units, kN and m when not given. */
export function stepUnits(model: TrussModel): StepUnits {
  const L = model.units?.length ?? "m";
  const F = model.units?.force ?? "kN";
  return { L, F, M: `${F}*${L}` };
}

/** Joints with a non-zero total load, in model order. */
export function loadPoints(model: TrussModel, loads: JointLoadTotals): LoadPoint[] {
  const points: LoadPoint[] = [];
  for (let k = 0; k < model.joints.length; k++) {
    if (loads.fx[k] === 0 && loads.fy[k] === 0) continue;
    const j = model.joints[k];
    points.push({ id: j.id, x: j.x, y: j.y, fx: loads.fx[k], fy: loads.fy[k] });
  }
  return points;
}

/** R with a joint id and, optionally, a component as its subscript: R_{B,y}. */
export function reactionSymbol(id: string, comp?: "x" | "y"): string {
  return `R_{\\mathrm{${escapeTex(id)}}${comp ? `,${comp}` : ""}}`;
}

/** Moments of forces at points about (x0, y0), counter-clockwise positive: fy·dx − fx·dy. */
export function momentTerms(points: LoadPoint[], x0: number, y0: number, u: StepUnits, what: string): TexTerm[] {
  const terms: TexTerm[] = [];
  for (const p of points) {
    const dx = p.x - x0;
    const dy = p.y - y0;
    if (p.fy !== 0 && dx !== 0) terms.push({ factors: [[p.fy, u.F], [dx, u.L]], sign: 1, value: p.fy * dx });
    if (p.fx !== 0 && dy !== 0) terms.push({ factors: [[p.fx, u.F], [dy, u.L]], sign: -1, value: p.fx * dy });
  }
  return collapseTerms(terms, u.M, what);
}

/** One component of forces at points, as addends. */
export function forceTerms(points: LoadPoint[], comp: "fx" | "fy", u: StepUnits, what: string): TexTerm[] {
  const terms: TexTerm[] = [];
  for (const p of points) if (p[comp] !== 0) terms.push({ factors: [[p[comp], u.F]], sign: 1, value: p[comp] });
  return collapseTerms(terms, u.F, what);
}

/** Many addends become one, their total, labelled with how many it stands for. */
export function collapseTerms(terms: TexTerm[], unit: string, what: string): TexTerm[] {
  if (terms.length <= MAX_WRITTEN_TERMS) return terms;
  const total = termTotal(terms);
  return [{ tex: `\\underbrace{${texFactor(total, unit)}}_{\\text{${terms.length} ${what}}}`, sign: 1, value: total }];
}

/** A number for running text: four significant figures, no exponent markup. */
export function plainNumber(v: number): string {
  const r = Number(v.toPrecision(4));
  return String(r === 0 ? 0 : r);
}
