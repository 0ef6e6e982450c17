import { SolveError } from "../errors";
import type { TrussModel } from "../types";

/** A member with the section properties virtual work needs. */
export type SectionedMember = { id: string; start: string; end: string; A: number; E: number };

/**
 * Every member with its A and E, or INVALID at the first member missing one
 * (path `members[i].A` or `members[i].E`): virtual work needs the axial
 * stiffness of every member that carries force in either case.
 */
export function requireSections(model: TrussModel): SectionedMember[] {
  return model.members.map((m, i) => {
    for (const key of ["A", "E"] as const) {
      const v = m[key];
      if (v === undefined || !Number.isFinite(v) || v <= 0) {
        const what = key === "A" ? "a cross-section area A" : "a modulus of elasticity E";
        throw new SolveError("INVALID", `Member ${m.id} needs ${what} (a positive number) for a deflection by virtual work.`, { path: `members[${i}].${key}` });
      }
    }
    return { id: m.id, start: m.start, end: m.end, A: m.A as number, E: m.E as number };
  });
}
