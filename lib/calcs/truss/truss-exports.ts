import type { TrussModel, TrussSolution } from "../../solve";
import type { CalcValue } from "../calc-types";
import { exportName } from "../export-name";
import { quantityValue } from "../quantity-value";
import { cleanForce } from "./force-sense";

/**
 * What a Truss calc offers other calcs: the whole solved truss as `model`,
 * and every member force `F_<member>_<case>` and support reaction
 * `R_<joint>_<case>_x` / `_y` as a quantity in the truss's force unit.
 */
export function trussExports(model: TrussModel, solution: TrussSolution, meta: { label: string; caseKinds: Record<string, string> }): Record<string, CalcValue> {
  const force = model.units?.force ?? "kN";
  const cases = model.loadCases.map((c) => c.id);
  const out: Record<string, CalcValue> = {
    model: { type: "truss", model, solution, cases, combinations: [], source: meta.label, caseKinds: meta.caseKinds },
  };
  for (const id of cases) {
    const result = solution.cases[id];
    // Solver round-off on a zero-force member would otherwise reach formulas as 1e-13 kN.
    const scale = Math.max(0, ...Object.values(result.forces).map(Math.abs));
    for (const [member, f] of Object.entries(result.forces)) out[exportName("F", member, id)] = quantityValue(cleanForce(f, scale), force);
    for (const [joint, r] of Object.entries(result.reactions)) {
      out[exportName("R", joint, id, "x")] = quantityValue(cleanForce(r.rx, scale), force);
      out[exportName("R", joint, id, "y")] = quantityValue(cleanForce(r.ry, scale), force);
    }
  }
  return out;
}
