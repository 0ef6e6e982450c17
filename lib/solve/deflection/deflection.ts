import { SolveError } from "../errors";
import { compareResults } from "../geometry/compare-results";
import { comparisonStep } from "../geometry/comparison-step";
import { indexJoints } from "../geometry/index-joints";
import { modelUnits } from "../geometry/model-units";
import { plainQty } from "../geometry/plain-qty";
import { solveCase } from "../geometry/solve-case";
import type { Comparison } from "../geometry/types";
import { escapeTex, texNum, texQty } from "../latex";
import { solveTruss } from "../truss";
import type { Step, TrussModel } from "../types";
import { requireSections } from "./require-sections";
import { spanCheck, type SpanCheck } from "./span-check";
import { UNIT_LOAD_CASE, unitLoadModel } from "./unit-load-model";
import { virtualWorkTable, type VirtualWorkTerm } from "./virtual-work-table";

/** Which deflection to find, and optionally the span ratio to check it against. */
export type DeflectionOptions = {
  loadCase: string;
  joint: string;
  direction: "x" | "y";
  /** Span ratio for the limit, e.g. 240 or 360 (allowable = span / ratio); needs `span`. */
  limitRatio?: number;
  /** Span for the limit, in the model's length unit; needs `limitRatio`. */
  span?: number;
};

/** A joint deflection by virtual work, its working, and its cross-check. */
export type DeflectionResult = {
  /** Deflection along +x or +y, in the model's length unit. */
  value: number;
  terms: VirtualWorkTerm[];
  /** The stiffness solution's displacement of the joint in the same direction; null if the solver gave none. */
  stiffnessValue: number | null;
  comparison: Comparison | null;
  agrees: boolean | null;
  /** Present when `limitRatio` and `span` are given. */
  check?: SpanCheck;
  steps: Step[];
};

/**
 * Unit-load method: δ = Σ N·n·L/(A·E). For an indeterminate truss n is taken
 * from the same indeterminate (compatible) solution of the unit load. The
 * theorem needs only that n be in equilibrium with the unit load, and a
 * compatible solution is in equilibrium, so the result is still exact; the
 * real N must be the compatible one, which the stiffness solution gives.
 */
export function deflection(model: TrussModel, options: DeflectionOptions): DeflectionResult {
  if (!model.joints.some((j) => j.id === options.joint)) {
    throw new SolveError("INVALID", `Joint ${options.joint} is not in the truss.`, { path: "joint" });
  }
  if (options.direction !== "x" && options.direction !== "y") {
    throw new SolveError("INVALID", `Direction must be "x" or "y".`, { path: "direction" });
  }
  const limit = readLimit(options);
  const members = requireSections(model);
  const { loadCase, result } = solveCase(model, options.loadCase);
  const virtual = solveTruss(unitLoadModel(model, options.joint, options.direction)).cases[UNIT_LOAD_CASE];
  if (!virtual) throw new SolveError("INVALID", "The unit-load case could not be solved.", { path: "joint" });
  const joints = indexJoints(model);
  const units = modelUnits(model);
  const terms: VirtualWorkTerm[] = members.map((m) => {
    const a = joints.get(m.start);
    const b = joints.get(m.end);
    const L = a && b ? Math.hypot(b.x - a.x, b.y - a.y) : 0;
    const N = result.forces[m.id] ?? 0;
    const n = virtual.forces[m.id] ?? 0;
    return { member: m.id, N, n, L, A: m.A, E: m.E, contribution: (N * n * L) / (m.A * m.E) };
  });
  const value = terms.reduce((s, t) => s + t.contribution, 0) + 0;
  const j = escapeTex(options.joint);
  const d = options.direction;
  const symbol = `\\delta_{${d},\\mathrm{${j}}}`;
  const sense = d === "y" ? (value < 0 ? "downward" : "upward") : value < 0 ? "to the left" : "to the right";
  const steps: Step[] = [
    {
      latex: `${symbol} = \\sum \\dfrac{N\\,n\\,L}{A\\,E}`,
      text: `Deflection of joint ${options.joint} along +${d} by virtual work: N are the member forces of load case ${loadCase.id}, n those caused by a unit load at ${options.joint} along +${d}; tension positive in both.`,
    },
    {
      latex: `Q = ${texQty(1, units.force)}\\ \\text{at}\\ \\mathrm{${j}},\\ +${d}`,
      text: `Virtual case: a unit force at ${options.joint} along +${d} alone; n is the member force per unit of it.`,
    },
    virtualWorkTable(terms, units),
    {
      latex: `${symbol} = ${texQty(value, units.length)}`,
      text: `Sum of the table: ${plainQty(value, units.length)}${Math.abs(value) > 0 ? ` (${sense})` : ""}.`,
    },
  ];
  const disp = result.displacements?.[options.joint];
  const stiffnessValue = disp ? (d === "x" ? disp.ux : disp.uy) : null;
  let comparison: Comparison | null = null;
  if (stiffnessValue !== null && Number.isFinite(stiffnessValue)) {
    const scale = Math.max(0, ...Object.values(result.displacements ?? {}).map((u) => Math.max(Math.abs(u.ux), Math.abs(u.uy))));
    comparison = compareResults(value, stiffnessValue, scale);
    steps.push(comparisonStep(symbol, `Deflection of ${options.joint}`, "virtual work", comparison, units.length));
  } else {
    steps.push({ latex: "\\text{No stiffness displacement to compare}", text: "The stiffness solution gave no displacement for this joint, so the cross-check is not available." });
  }
  const check = limit ? spanCheck(value, limit.span, limit.ratio) : undefined;
  if (check) {
    const ok = check.pass;
    steps.push({
      latex: `\\delta_{\\mathrm{allow}} = \\dfrac{${texQty(check.span, units.length)}}{${texNum(check.ratio)}} = ${texQty(check.allowable, units.length)};\\quad |${symbol}| = ${texQty(Math.abs(value), units.length)} ${ok ? "\\le" : ">"} ${texQty(check.allowable, units.length)}\\ ${ok ? "\\checkmark" : "\\times"}`,
      text: `Limit span/${plainQty(check.ratio)} = ${plainQty(check.allowable, units.length)}; the deflection ${plainQty(Math.abs(value), units.length)} ${ok ? "is within it" : "exceeds it"} (utilization ${plainQty(check.utilization)}).`,
    });
  }
  return { value, terms, stiffnessValue, comparison, agrees: comparison ? comparison.agrees : null, check, steps };
}

function readLimit(options: DeflectionOptions): { span: number; ratio: number } | null {
  const { limitRatio, span } = options;
  if (limitRatio === undefined && span === undefined) return null;
  if (limitRatio === undefined || !Number.isFinite(limitRatio) || limitRatio <= 0) {
    throw new SolveError("INVALID", "A deflection limit needs a positive span ratio (e.g. 240 for span/240).", { path: "limitRatio" });
  }
  if (span === undefined || !Number.isFinite(span) || span <= 0) {
    throw new SolveError("INVALID", "A deflection limit needs the span (a positive length).", { path: "span" });
  }
  return { span, ratio: limitRatio };
}
