import { z } from "zod";

/**
 * Largest magnitude accepted for any input number. Far beyond any real truss
 * in any supported unit (E in N/m² is about 2·10¹¹), and small enough that
 * squares and products of inputs stay finite in double precision.
 */
export const MAX_INPUT_MAGNITUDE = 1e15;

// zod rejects NaN and ±Infinity for z.number(). Value checks (magnitude, empty
// ids, positive A and E) run afterwards in one plain pass, `checkValues`:
// per-field zod checks cost several times the whole parse on a 10,000-joint truss.
const num = z.number();
const id = z.string();

/** The shape of a truss model; values, cross-references and geometry are checked afterwards by `validateTruss`. */
export const trussModelSchema = z.object({
  units: z
    .object({
      length: z.enum(["m", "mm", "ft", "in"]).optional(),
      force: z.enum(["kN", "N", "kip", "lbf"]).optional(),
    })
    .optional(),
  joints: z.array(z.object({ id, x: num, y: num })).min(2),
  members: z.array(z.object({ id, start: id, end: id, A: num.optional(), E: num.optional() })).min(1),
  supports: z.array(z.object({ joint: id, type: z.enum(["pin", "roller"]), direction: z.tuple([num, num]).optional() })).min(1),
  loadCases: z.array(z.object({ id, loads: z.array(z.object({ joint: id, fx: num.optional(), fy: num.optional() })) })),
});
