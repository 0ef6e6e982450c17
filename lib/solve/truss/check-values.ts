import { SolveError } from "../errors";
import type { TrussModel } from "../types";
import { MAX_INPUT_MAGNITUDE } from "./truss-schema";

/**
 * Throws INVALID at the first value a well-shaped model cannot use, in model
 * order: an empty id, a number beyond ±MAX_INPUT_MAGNITUDE, or an A or E
 * that is given but not greater than zero.
 */
export function checkValues(model: TrussModel): void {
  const { joints, members, supports, loadCases } = model;
  for (let i = 0; i < joints.length; i++) {
    const j = joints[i];
    idOk(j.id, "joints", i, "id");
    sized(j.x, "joints", i, "x");
    sized(j.y, "joints", i, "y");
  }
  for (let i = 0; i < members.length; i++) {
    const m = members[i];
    idOk(m.id, "members", i, "id");
    idOk(m.start, "members", i, "start");
    idOk(m.end, "members", i, "end");
    if (m.A !== undefined) positive(m.A, i, "A", `Member ${m.id} has area A = ${m.A}; an area must be greater than zero (leave A out if it is not known).`);
    if (m.E !== undefined) positive(m.E, i, "E", `Member ${m.id} has modulus E = ${m.E}; a modulus must be greater than zero (leave E out if it is not known).`);
  }
  for (let i = 0; i < supports.length; i++) {
    const s = supports[i];
    idOk(s.joint, "supports", i, "joint");
    if (s.direction) {
      sized(s.direction[0], "supports", i, "direction[0]");
      sized(s.direction[1], "supports", i, "direction[1]");
    }
  }
  for (let i = 0; i < loadCases.length; i++) {
    const c = loadCases[i];
    idOk(c.id, "loadCases", i, "id");
    const list = `loadCases[${i}].loads`;
    for (let k = 0; k < c.loads.length; k++) {
      const p = c.loads[k];
      idOk(p.joint, list, k, "joint");
      if (p.fx !== undefined) sized(p.fx, list, k, "fx");
      if (p.fy !== undefined) sized(p.fy, list, k, "fy");
    }
  }
}

// Paths are built only on failure: the checks run over every field of a model of any size.
function idOk(id: string, list: string, i: number, field: string): void {
  if (id.trim().length > 0) return;
  const path = `${list}[${i}].${field}`;
  throw new SolveError("INVALID", `${path} is empty; every id needs at least one visible character.`, { path });
}

function sized(v: number, list: string, i: number, field: string): void {
  if (Math.abs(v) <= MAX_INPUT_MAGNITUDE) return;
  const path = `${list}[${i}].${field}`;
  throw new SolveError("INVALID", `${path} is ${v}, larger in magnitude than the ${MAX_INPUT_MAGNITUDE} this solver accepts.`, { path });
}

function positive(v: number, i: number, field: "A" | "E", message: string): void {
  if (!(v > 0)) throw new SolveError("INVALID", message, { path: `members[${i}].${field}` });
  sized(v, "members", i, field);
}
