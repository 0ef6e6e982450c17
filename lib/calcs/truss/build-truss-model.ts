import { isSolveError, lineLoadToPanelLoads, SolveError, validateTruss, type TrussModel } from "../../solve";
import type { TrussInputs } from "./truss-inputs";
import type { TrussUnits } from "./truss-units";

/**
 * The solver's model of a Truss calc, in consistent units: sections converted
 * (mm² → m², GPa → kN/m²…), explicit joint loads first, then each line load
 * lumped at its panel points and appended to its case. Throws SolveError
 * INVALID with the input path: the model's own fields first (the solver's
 * paths are the inputs' own, `members[3].end`), then `lineLoads[1].chord[3]`.
 */
export function buildTrussModel(inputs: TrussInputs, units: TrussUnits): TrussModel {
  const model: TrussModel = {
    units: { length: units.length, force: units.force },
    joints: inputs.joints.map((j) => ({ id: j.id, x: j.x, y: j.y })),
    members: inputs.members.map((m) => ({
      id: m.id,
      start: m.start,
      end: m.end,
      ...(m.A === undefined ? {} : { A: m.A * units.areaToModel }),
      ...(m.E === undefined ? {} : { E: m.E * units.modulusToModel }),
    })),
    supports: inputs.supports.map((s) => ({ joint: s.joint, type: s.type, ...(s.direction ? { direction: [s.direction[0], s.direction[1]] as [number, number] } : {}) })),
    loadCases: inputs.loadCases.map((c) => ({ id: c.id, loads: c.loads.map((l) => ({ ...l })) })),
  };
  const lineLoads = inputs.lineLoads ?? [];
  // The model's own problems come first: a member to a missing joint is the error to show, not the chord it breaks.
  if (lineLoads.length > 0) validateTruss(model);
  lineLoads.forEach((line, k) => {
    const target = model.loadCases.find((c) => c.id === line.case);
    if (!target) {
      const names = model.loadCases.map((c) => c.id).join(", ") || "none";
      throw new SolveError("INVALID", `Line load ${k + 1} is for load case "${line.case}", which is not in this truss (cases: ${names}).`, { path: `lineLoads[${k}].case` });
    }
    try {
      target.loads.push(...lineLoadToPanelLoads({ model, chord: line.chord, w: line.w, projected: line.projected }));
    } catch (e) {
      if (!isSolveError(e)) throw e;
      // The converter names its own options; put them under this line load.
      const path = e.path ? `lineLoads[${k}].${e.path}` : `lineLoads[${k}]`;
      throw new SolveError("INVALID", e.message.replace(/^line load: /, `Line load ${k + 1}: `), { path });
    }
  });
  return model;
}
