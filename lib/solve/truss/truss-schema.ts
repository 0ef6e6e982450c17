import { z } from "zod";

/**
 * Largest magnitude accepted for any input number. Far beyond any real truss
 * in any supported unit (E in N/m² is about 2·10¹¹), and small enough that
 * squares and products of inputs stay finite in double precision.
 */
export const MAX_INPUT_MAGNITUDE = 1e15;

const finite = z.number().min(-MAX_INPUT_MAGNITUDE).max(MAX_INPUT_MAGNITUDE);
const positive = z.number().positive().max(MAX_INPUT_MAGNITUDE);
const id = z.string().refine((s) => s.trim().length > 0, { message: "must not be empty" });

/** The shape of a truss model; cross-references and geometry are checked afterwards by `validateTruss`. */
export const trussModelSchema = z.object({
  units: z
    .object({
      length: z.enum(["m", "mm", "ft", "in"]).optional(),
      force: z.enum(["kN", "N", "kip", "lbf"]).optional(),
    })
    .optional(),
  joints: z.array(z.object({ id, x: finite, y: finite })).min(2),
  members: z.array(z.object({ id, start: id, end: id, A: positive.optional(), E: positive.optional() })).min(1),
  supports: z
    .array(
      z.object({
        joint: id,
        type: z.enum(["pin", "roller"]),
        direction: z.tuple([finite, finite]).optional(),
      }),
    )
    .min(1),
  loadCases: z.array(
    z.object({
      id,
      loads: z.array(z.object({ joint: id, fx: finite.optional(), fy: finite.optional() })),
    }),
  ),
});
