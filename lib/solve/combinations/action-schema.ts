import { z } from "zod";
import { SolveError } from "../errors";
import { standardKinds } from "./standard-rules";
import type { LoadStandard } from "./types";

/** zod schema of one action (kind checked against the standard separately). */
export const actionSchema = z.object({
  id: z.string().min(1),
  kind: z.string().min(1),
  value: z.number(),
  psi0: z.number().min(0).max(1).optional(),
});

export const standardSchema = z.enum(["ASCE7-16-LRFD", "ASCE7-22-LRFD", "ASCE7-16-ASD", "EN1990-6.10", "EN1990-6.10ab"]);

/** Throws INVALID naming the field when ids repeat or a kind is not one the standard knows. */
export function checkActions(standard: LoadStandard | null, actions: { id: string; kind?: string }[], field: string): void {
  const seen = new Set<string>();
  actions.forEach((a, i) => {
    if (seen.has(a.id)) throw new SolveError("INVALID", `${field}[${i}].id: "${a.id}" is used twice`, { path: `${field}[${i}].id` });
    seen.add(a.id);
    if (!standard) return;
    const kinds = standardKinds(standard);
    if (a.kind === undefined || !kinds.includes(a.kind)) {
      throw new SolveError("INVALID", `${field}[${i}].kind: must be one of ${kinds.join(", ")} for ${standard}`, { path: `${field}[${i}].kind` });
    }
  });
}
