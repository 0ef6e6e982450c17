import { isSolveError, solveTruss, type TrussModel } from "../../solve";
import type { EvaluateContext } from "../calc-kind-module";
import { errorEvaluation } from "../error-evaluation";
import { computedEvaluation, failedEvaluation, type KindEvaluation } from "../kind-evaluation";
import { buildTrussModel } from "./build-truss-model";
import { countFromInputs, describeStability } from "./describe-stability";
import { trussCaseViews } from "./truss-case-views";
import { trussExports } from "./truss-exports";
import type { TrussInputs } from "./truss-inputs";
import { trussUnits } from "./truss-units";
import type { TrussView } from "./truss-view";

const TRUSS_FIELDS = ["units", "joints", "members", "supports", "loadCases", "lineLoads", "generator"] as const;

/**
 * Solves a Truss calc: stiffness solution of every case, determinacy and
 * stability in words, the reactions' equilibrium steps, and the exports other
 * calcs read. An invalid input is reported on its field (`members[3].end`);
 * an unstable truss as a message naming the joints that can move.
 */
export function evaluateTruss(inputs: TrussInputs, _resolved: unknown, context: EvaluateContext): KindEvaluation<TrussView> {
  const units = trussUnits(inputs.units);
  const counts = countFromInputs(inputs);
  const base: TrussView = { units: labelsOf(units), counts, classification: null, stable: false, stability: "", cases: [] };
  let model: TrussModel;
  try {
    model = buildTrussModel(inputs, units);
    const solution = solveTruss(model);
    const caseKinds = Object.fromEntries(inputs.loadCases.map((c) => [c.id, c.kind]));
    const view: TrussView = {
      ...base,
      classification: solution.classification,
      stable: true,
      stability: describeStability(solution),
      cases: trussCaseViews(model, solution, caseKinds, units),
    };
    return computedEvaluation({ exports: trussExports(model, solution, { label: context.label, caseKinds }), steps: solution.steps ?? [], view });
  } catch (e) {
    if (isSolveError(e) && e.code === "UNSTABLE") {
      return failedEvaluation({ messages: [e.message], view: { ...base, stability: `Unstable: ${e.message.replace(/^The truss is unstable: /, "")}` } });
    }
    return errorEvaluation(e, { fields: TRUSS_FIELDS }, { ...base, stability: "Not checked: the inputs have a problem to fix first." });
  }
}

function labelsOf(u: ReturnType<typeof trussUnits>): TrussView["units"] {
  const { length, force, area, modulus, displacement, lineLoad, moment } = u;
  return { length, force, area, modulus, displacement, lineLoad, moment };
}
