import { z } from "zod";

const positive = z.number().positive();

/**
 * A member's section as entered: the dimensions of a common shape, or its
 * properties (A, least r, and for timber the least dimension d), in the
 * design length unit (mm with SI trusses, in with US ones). Geometric
 * consistency (walls thinner than the section…) is checked by the core.
 */
export const memberSectionInput = z.discriminatedUnion("shape", [
  z.strictObject({ shape: z.literal("angle"), d: positive, b: positive, t: positive }),
  z.strictObject({ shape: z.literal("double-angle"), d: positive, b: positive, t: positive, gap: z.number().nonnegative() }),
  z.strictObject({ shape: z.literal("channel"), d: positive, bf: positive, tf: positive, tw: positive }),
  z.strictObject({ shape: z.literal("chs"), D: positive, t: positive }),
  z.strictObject({ shape: z.literal("rhs"), b: positive, h: positive, t: positive, cornerRadius: z.number().nonnegative().optional() }),
  z.strictObject({ shape: z.literal("round"), D: positive }),
  z.strictObject({ shape: z.literal("rectangle"), b: positive, h: positive }),
  z.strictObject({ shape: z.literal("timber"), b: positive, d: positive, product: z.enum(["sawn", "glulam"]).optional() }),
  z.strictObject({ shape: z.literal("properties"), A: positive, rmin: positive, d: positive.optional() }),
]);

/** A parsed member section. */
export type MemberSectionInput = z.infer<typeof memberSectionInput>;
