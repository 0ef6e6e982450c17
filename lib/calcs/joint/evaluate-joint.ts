import { jointEquilibrium, solveByJoints, type Comparison } from "../../solve";
import type { CalcValue } from "../calc-types";
import { errorEvaluation } from "../error-evaluation";
import { exportName } from "../export-name";
import { computedEvaluation, failedEvaluation, type KindEvaluation } from "../kind-evaluation";
import { quantityValue } from "../quantity-value";
import { readTrussValue } from "../read-truss-value";
import { resolveLoadCase } from "../resolve-load-case";
import { forceSense } from "../truss/force-sense";
import type { JointInputs } from "./joint-inputs";
import type { JointForceRow, JointView } from "./joint-view";

const FIELDS = ["truss", "loadCase", "joint", "known", "sequence"] as const;

/**
 * Method of joints on the referenced truss, at one joint or as a sequence.
 * Exports `F_<member>` for every force found, in the truss's force unit.
 */
export function evaluateJoint(inputs: JointInputs, resolved: Record<string, CalcValue>): KindEvaluation<JointView> {
  const truss = readTrussValue(resolved, inputs.truss);
  if (!truss) return failedEvaluation({ fieldErrors: [{ path: "truss", message: `${inputs.truss} is not a Truss or Combinations calc.` }] });
  const loadCase = resolveLoadCase(truss, inputs.loadCase, inputs.truss);
  if (!loadCase.ok) return failedEvaluation({ fieldErrors: [loadCase.error] });
  const { model } = truss;
  const force = model.units?.force ?? "kN";
  const known = inputs.known ?? {};
  try {
    if (inputs.sequence) {
      const r = solveByJoints(model, { loadCase: loadCase.id, known });
      const view: JointView = {
        mode: "sequence",
        truss: inputs.truss,
        loadCase: loadCase.id,
        order: r.order,
        rows: rows(r.forces, r.comparison),
        checks: r.checks.map((c) => ({ joint: c.joint, balanced: c.balanced })),
        complete: r.complete,
        stuck: r.stuck?.message ?? null,
        agrees: r.agrees,
        units: { force },
      };
      const messages = r.stuck ? [r.stuck.message] : r.agrees ? [] : ["The joint-by-joint forces differ from the full solution; see the comparison in the working."];
      return computedEvaluation({ exports: exportsOf(r.forces, force), steps: r.steps, view, messages });
    }
    const joint = inputs.joint ?? "";
    const r = jointEquilibrium(model, { loadCase: loadCase.id, joint, known });
    const view: JointView = {
      mode: "joint",
      truss: inputs.truss,
      loadCase: loadCase.id,
      joint,
      rows: rows(r.forces, r.comparison),
      known,
      residual: r.residual,
      balanced: r.balanced,
      agrees: r.agrees,
      units: { force },
    };
    const messages = r.agrees ? [] : [r.balanced ? "The forces found differ from the full solution; see the comparison in the working." : `Joint ${joint} does not balance with the known forces given; check them.`];
    return computedEvaluation({ exports: exportsOf(r.forces, force), steps: r.steps, view, messages });
  } catch (e) {
    // Too many unknowns at the chosen joint is a problem with the choice of joint.
    return errorEvaluation(e, { fields: FIELDS, fallbackField: inputs.sequence ? "sequence" : "joint", context: inputs.truss });
  }
}

function rows(forces: Record<string, number>, comparison: Record<string, Comparison>): JointForceRow[] {
  const scale = Math.max(0, ...Object.values(forces).map(Math.abs));
  return Object.entries(forces).map(([member, force]) => ({
    member,
    force,
    sense: forceSense(force, scale),
    stiffness: comparison[member]?.stiffness ?? null,
    agrees: comparison[member]?.agrees ?? null,
  }));
}

function exportsOf(forces: Record<string, number>, unit: string): Record<string, CalcValue> {
  return Object.fromEntries(Object.entries(forces).map(([m, f]) => [exportName("F", m), quantityValue(f, unit)]));
}
