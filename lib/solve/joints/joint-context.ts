import { forceScale } from "../geometry/force-scale";
import { indexJoints } from "../geometry/index-joints";
import { modelUnits } from "../geometry/model-units";
import { solveCase } from "../geometry/solve-case";
import type { ModelUnits } from "../geometry/types";
import type { CaseResult, Joint, LoadCase, TrussModel, TrussSolution } from "../types";

/** Everything joint equilibrium needs about the model and one load case, computed once per request. */
export type JointContext = {
  model: TrussModel;
  joints: Map<string, Joint>;
  loadCase: LoadCase;
  result: CaseResult;
  solution: TrussSolution;
  units: ModelUnits;
  /** Largest load or reaction component: the yardstick for "balances within round-off". */
  scale: number;
};

/** Solves the truss once so a whole sequence of joints shares its reactions. */
export function jointContext(model: TrussModel, loadCaseId: string): JointContext {
  const { loadCase, result, solution } = solveCase(model, loadCaseId);
  return {
    model, joints: indexJoints(model), loadCase, result, solution, units: modelUnits(model), scale: forceScale(loadCase, result),
  };
}
