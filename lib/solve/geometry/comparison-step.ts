import { texQty } from "../latex";
import type { Step } from "../types";
import { plainQty } from "./plain-qty";
import type { Comparison } from "./types";

/**
 * One line setting a hand result beside the stiffness result. A difference
 * beyond round-off is written out, not just flagged, so the checker sees
 * how far apart the two are.
 */
export function comparisonStep(symbol: string, words: string, methodName: string, c: Comparison, unit: string): Step {
  const lhs = `${symbol}:\\quad ${texQty(c.method, unit)}\\ \\text{(${methodName})}`;
  const rhs = `${texQty(c.stiffness, unit)}\\ \\text{(stiffness)}`;
  if (c.agrees) {
    return { latex: `${lhs} = ${rhs}\\ \\checkmark`, text: `${words}: ${methodName} and stiffness method agree (${plainQty(c.method, unit)}).` };
  }
  return {
    latex: `${lhs} \\neq ${rhs}\\quad \\Delta = ${texQty(c.difference, unit)}`,
    text: `${words}: ${methodName} gives ${plainQty(c.method, unit)} but the stiffness method gives ${plainQty(c.stiffness, unit)}, a difference of ${plainQty(c.difference, unit)} — beyond round-off; check the input.`,
  };
}
