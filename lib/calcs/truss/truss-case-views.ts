import type { TrussModel, TrussSolution } from "../../solve";
import { cleanForce, forceSense } from "./force-sense";
import type { TrussUnits } from "./truss-units";
import type { TrussCaseView } from "./truss-view";

/** Per-case tables for the view: loads, reactions, member forces and displacements, in the truss's units. */
export function trussCaseViews(model: TrussModel, solution: TrussSolution, kinds: Record<string, string>, units: TrussUnits): TrussCaseView[] {
  return model.loadCases.map((loadCase) => {
    const result = solution.cases[loadCase.id];
    const totals = new Map<string, { joint: string; fx: number; fy: number }>();
    for (const load of loadCase.loads) {
      const t = totals.get(load.joint) ?? { joint: load.joint, fx: 0, fy: 0 };
      t.fx += load.fx ?? 0;
      t.fy += load.fy ?? 0;
      totals.set(load.joint, t);
    }
    const forces = Object.entries(result.forces);
    const scale = Math.max(0, ...forces.map(([, f]) => Math.abs(f)));
    const view: TrussCaseView = {
      id: loadCase.id,
      kind: kinds[loadCase.id] ?? loadCase.id,
      loads: [...totals.values()].filter((t) => t.fx !== 0 || t.fy !== 0),
      reactions: Object.entries(result.reactions).map(([joint, r]) => ({ joint, rx: cleanForce(r.rx, scale) + 0, ry: cleanForce(r.ry, scale) + 0 })),
      forces: forces.map(([member, f]) => ({ member, force: cleanForce(f, scale) + 0, sense: forceSense(f, scale) })),
    };
    if (result.displacements) {
      const k = units.lengthToDisplacement;
      view.displacements = Object.entries(result.displacements).map(([joint, d]) => ({ joint, ux: d.ux * k + 0, uy: d.uy * k + 0 }));
    }
    return view;
  });
}
