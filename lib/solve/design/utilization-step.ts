import { texNum, texQty } from "../latex";
import type { Step } from "../types";

/** The closing line of a member check: η = demand / capacity against 1.0. */
export function utilizationStep(demand: number, capacity: number, capacityTex: string, forceUnit: string): Step {
  const utilization = demand / capacity;
  const pass = utilization <= 1;
  return {
    latex: `\\eta = \\frac{|P|}{${capacityTex}} = \\frac{${texQty(demand, forceUnit)}}{${texQty(capacity, forceUnit)}} = ${texNum(utilization, 3)} ${pass ? "\\le" : ">"} 1.0\\quad\\text{${pass ? "OK" : "NOT OK"}}`,
    text: pass ? "Utilization within the design strength." : "Utilization exceeds the design strength.",
  };
}
