import { SolveError } from "../errors";
import type { TrussModel } from "../types";

/** Known member forces must name members of the truss and be finite; INVALID at `known.<id>` otherwise. */
export function checkKnownForces(model: TrussModel, known: Record<string, number>): void {
  for (const [id, v] of Object.entries(known)) {
    if (!model.members.some((m) => m.id === id)) {
      throw new SolveError("INVALID", `Member ${id} is not in the truss.`, { path: `known.${id}` });
    }
    if (typeof v !== "number" || !Number.isFinite(v)) {
      throw new SolveError("INVALID", `The known force in ${id} is not a finite number.`, { path: `known.${id}` });
    }
  }
}
