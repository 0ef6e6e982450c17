import { deflection } from "../../solve";
import type { CalcValue } from "../calc-types";
import { errorEvaluation } from "../error-evaluation";
import { computedEvaluation, failedEvaluation, type KindEvaluation } from "../kind-evaluation";
import { quantityValue } from "../quantity-value";
import { readTrussValue } from "../read-truss-value";
import { resolveLoadCase } from "../resolve-load-case";
import type { DeflectionInputs } from "./deflection-inputs";
import type { DeflectionView } from "./deflection-view";

/** Model length unit → the unit deflections are quoted in. */
const DEFLECTION_UNIT: Record<string, { unit: string; factor: number }> = {
  m: { unit: "mm", factor: 1000 },
  mm: { unit: "mm", factor: 1 },
  ft: { unit: "in", factor: 12 },
  in: { unit: "in", factor: 1 },
};

/**
 * Unit-load method Σ N·n·L/(A·E) on the referenced truss, cross-checked with
 * the stiffness displacement and set against span / ratio. Exports `delta`
 * (signed, along +direction), `allowable` (both in mm or in) and `utilization`.
 * A member without A or E is reported as a problem of the truss.
 */
export function evaluateDeflection(inputs: DeflectionInputs, resolved: Record<string, CalcValue>): KindEvaluation<DeflectionView> {
  const truss = readTrussValue(resolved, inputs.truss);
  if (!truss) return failedEvaluation({ fieldErrors: [{ path: "truss", message: `${inputs.truss} is not a Truss or Combinations calc.` }] });
  const loadCase = resolveLoadCase(truss, inputs.loadCase, inputs.truss);
  if (!loadCase.ok) return failedEvaluation({ fieldErrors: [loadCase.error] });
  const { model } = truss;
  const length = model.units?.length ?? "m";
  const shown = DEFLECTION_UNIT[length];
  const xs = model.joints.map((j) => j.x);
  const span = inputs.span ?? Math.max(...xs) - Math.min(...xs);
  if (!(span > 0)) return failedEvaluation({ fieldErrors: [{ path: "span", message: `${inputs.truss} has no horizontal extent; enter the span for the limit.` }] });
  try {
    const r = deflection(model, { loadCase: loadCase.id, joint: inputs.joint, direction: inputs.direction, limitRatio: inputs.limitRatio, span });
    const check = r.check;
    if (!check) throw new Error("The deflection limit was not checked.");
    const value = r.value * shown.factor;
    const view: DeflectionView = {
      truss: inputs.truss,
      loadCase: loadCase.id,
      joint: inputs.joint,
      direction: inputs.direction,
      value,
      sense: senseOf(r.value, inputs.direction),
      stiffnessValue: r.stiffnessValue === null ? null : r.stiffnessValue * shown.factor,
      agrees: r.agrees,
      span,
      ratio: check.ratio,
      allowable: check.allowable * shown.factor,
      utilization: check.utilization,
      pass: check.pass,
      terms: r.terms.map((t) => ({ member: t.member, N: t.N, n: t.n, L: t.L, contribution: t.contribution * shown.factor })),
      units: { deflection: shown.unit, length, force: model.units?.force ?? "kN" },
    };
    const exports = {
      delta: quantityValue(value, shown.unit),
      allowable: quantityValue(check.allowable * shown.factor, shown.unit),
      utilization: quantityValue(check.utilization, ""),
    };
    const messages = r.agrees === false ? ["Virtual work and the stiffness solution disagree; see the comparison in the working."] : [];
    return computedEvaluation({ exports, steps: r.steps, view, messages });
  } catch (e) {
    return errorEvaluation(e, { fields: ["loadCase", "joint", "direction", "limitRatio", "span"], context: inputs.truss });
  }
}

function senseOf(v: number, d: "x" | "y"): string {
  if (v === 0) return "none";
  if (d === "y") return v < 0 ? "downward" : "upward";
  return v < 0 ? "to the left" : "to the right";
}
