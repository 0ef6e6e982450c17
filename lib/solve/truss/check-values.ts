import { SolveError } from "../errors";
import type { TrussModel } from "../types";
import { MAX_INPUT_MAGNITUDE } from "./truss-schema";

/**
 * Throws INVALID at the first value a well-shaped model cannot use, in model
 * order: an empty id, a number beyond ±MAX_INPUT_MAGNITUDE, or an A or E
 * that is given but not greater than zero.
 */
export function checkValues(model: TrussModel): void {
  model.joints.forEach((j, i) => {
    idOk(j.id, `joints[${i}].id`);
    sized(j.x, `joints[${i}].x`);
    sized(j.y, `joints[${i}].y`);
  });
  model.members.forEach((m, i) => {
    idOk(m.id, `members[${i}].id`);
    idOk(m.start, `members[${i}].start`);
    idOk(m.end, `members[${i}].end`);
    if (m.A !== undefined) positive(m.A, `members[${i}].A`, `Member ${m.id} has area A = ${m.A}; an area must be greater than zero (leave A out if it is not known).`);
    if (m.E !== undefined) positive(m.E, `members[${i}].E`, `Member ${m.id} has modulus E = ${m.E}; a modulus must be greater than zero (leave E out if it is not known).`);
  });
  model.supports.forEach((s, i) => {
    idOk(s.joint, `supports[${i}].joint`);
    if (s.direction) s.direction.forEach((d, k) => sized(d, `supports[${i}].direction[${k}]`));
  });
  model.loadCases.forEach((c, i) => {
    idOk(c.id, `loadCases[${i}].id`);
    c.loads.forEach((p, k) => {
      idOk(p.joint, `loadCases[${i}].loads[${k}].joint`);
      if (p.fx !== undefined) sized(p.fx, `loadCases[${i}].loads[${k}].fx`);
      if (p.fy !== undefined) sized(p.fy, `loadCases[${i}].loads[${k}].fy`);
    });
  });
}

function idOk(id: string, path: string): void {
  if (id.trim().length === 0) throw new SolveError("INVALID", `${path} is empty; every id needs at least one visible character.`, { path });
}

function sized(v: number, path: string): void {
  if (Math.abs(v) > MAX_INPUT_MAGNITUDE) throw new SolveError("INVALID", `${path} is ${v}, larger in magnitude than the ${MAX_INPUT_MAGNITUDE} this solver accepts.`, { path });
}

function positive(v: number, path: string, message: string): void {
  if (!(v > 0)) throw new SolveError("INVALID", message, { path });
  sized(v, path);
}
