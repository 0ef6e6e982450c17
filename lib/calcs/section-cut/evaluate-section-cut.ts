import { cutSection } from "../../solve";
import type { CalcValue } from "../calc-types";
import { errorEvaluation } from "../error-evaluation";
import { exportName } from "../export-name";
import { computedEvaluation, failedEvaluation, type KindEvaluation } from "../kind-evaluation";
import { quantityValue } from "../quantity-value";
import { readTrussValue } from "../read-truss-value";
import { forceSense } from "../truss/force-sense";
import { resolveLoadCase } from "../resolve-load-case";
import { chooseCut } from "./choose-cut";
import type { SectionCutInputs } from "./section-cut-inputs";
import type { SectionCutView } from "./section-cut-view";

const FIELDS = ["truss", "loadCase", "members", "keep", "panel"] as const;

/**
 * Method of sections on the referenced truss: the free body on the kept side,
 * one equation per cut member, each result beside the full solution. Exports
 * `F_<member>` for every cut member, in the truss's force unit.
 */
export function evaluateSectionCut(inputs: SectionCutInputs, resolved: Record<string, CalcValue>): KindEvaluation<SectionCutView> {
  const truss = readTrussValue(resolved, inputs.truss);
  if (!truss) return failedEvaluation({ fieldErrors: [{ path: "truss", message: `${inputs.truss} is not a Truss or Combinations calc.` }] });
  const loadCase = resolveLoadCase(truss, inputs.loadCase, inputs.truss);
  if (!loadCase.ok) return failedEvaluation({ fieldErrors: [loadCase.error] });
  const { model } = truss;
  try {
    const cut = chooseCut(model, inputs);
    const result = cutSection(model, { loadCase: loadCase.id, members: cut.members, keep: cut.keep });
    const scale = Math.max(0, ...Object.values(result.forces).map(Math.abs));
    const force = model.units?.force ?? "kN";
    const view: SectionCutView = {
      truss: inputs.truss,
      loadCase: loadCase.id,
      members: cut.members,
      proposed: cut.proposed,
      description: cut.description,
      keep: cut.keep,
      keptJoints: result.keptJoints,
      externalForces: result.externalForces,
      rows: cut.members.map((member) => ({
        member,
        force: result.forces[member],
        sense: forceSense(result.forces[member], scale),
        method: result.pivots[member] ? "moment" : "force sum",
        pivot: result.pivots[member],
        pivotKind: result.pivotKind[member],
        stiffness: result.comparison[member]?.stiffness ?? null,
        agrees: result.comparison[member]?.agrees ?? null,
      })),
      agrees: result.agrees,
      units: { force, length: model.units?.length ?? "m" },
    };
    const exports = Object.fromEntries(cut.members.map((m) => [exportName("F", m), quantityValue(result.forces[m], force)]));
    const messages = result.agrees ? [] : ["The section's forces differ from the full solution; check the cut and the loads (see the comparison in the working)."];
    return computedEvaluation({ exports, steps: result.steps, view, messages });
  } catch (e) {
    return errorEvaluation(e, { fields: FIELDS, fallbackField: "members", context: inputs.truss });
  }
}
