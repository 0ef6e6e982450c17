import type { Reaction, Step, TrussModel } from "../types";
import { checkReactionSteps } from "./check-reaction-steps";
import type { JointLoadTotals } from "./joint-loads";
import { loadPoints, stepUnits } from "./reaction-terms";
import { staticsReactionSteps } from "./statics-reaction-steps";

/**
 * The global-equilibrium working for the reactions of one load case (its
 * loads totalled per joint): ΣM about a support, ΣFx and ΣFy, with the
 * numbers and units in. On one pin and one roller the equations are solved
 * in turn by statics; on any other support layout they check the reactions
 * of the stiffness solution.
 */
export function reactionSteps(model: TrussModel, loads: JointLoadTotals, reactions: Record<string, Reaction>): Step[] {
  const units = stepUnits(model);
  const points = loadPoints(model, loads);
  const pins = model.supports.filter((s) => s.type === "pin");
  const rollers = model.supports.filter((s) => s.type === "roller");
  if (pins.length === 1 && rollers.length === 1) {
    const supports = { pin: pins[0].joint, roller: rollers[0].joint, direction: rollers[0].direction ?? [0, 1] };
    const solved = staticsReactionSteps(model, supports, points, units);
    if (solved) return solved;
  }
  return checkReactionSteps(model, points, reactions, units);
}
