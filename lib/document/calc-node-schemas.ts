import { z } from "zod";
import { calcInputSchemas } from "../calcs/calc-input-schemas";
import { calcLabelSchema } from "../calcs/calc-label";
import type { CalcKind } from "../calcs/calc-types";

/** A calc id: a UUID or a similar random token (8–64 letters, digits, - or _). */
export const calcIdSchema = z.string().regex(/^[A-Za-z0-9][A-Za-z0-9_-]{7,63}$/, "must be a calc id (8–64 letters, digits, - or _)");

/** The node of one calc kind: its type is the kind, its attrs the id, label and that kind's inputs. */
export function calcNodeSchema<K extends CalcKind>(kind: K) {
  return z.strictObject({
    type: z.literal(kind),
    attrs: z.strictObject({ id: calcIdSchema, label: calcLabelSchema, inputs: calcInputSchemas[kind] }),
  });
}
