import { z } from "zod";
import { checkAisc360Member } from "./check-aisc360-member";
import { checkEn1993Member } from "./check-en1993-member";
import type { CheckMemberOptions, CheckMemberResult } from "./check-member-types";
import { checkNdsMember } from "./check-nds-member";
import { memberSectionSchema, resolveMemberSection } from "./member-section";
import { parseInput } from "./parse-input";
import { resolveUnits, unitsOptionSchema } from "./unit-labels";

const positive = z.number().positive();
const common = {
  force: z.number(),
  section: memberSectionSchema,
  length: z.number().nonnegative(),
  K: positive.optional(),
  units: unitsOptionSchema,
};

const schema = z.discriminatedUnion("material", [
  z
    .object({
      ...common,
      material: z.literal("steel-aisc360"),
      Fy: positive,
      Fu: positive,
      E: positive,
      An: positive.optional(),
      U: positive.max(1).optional(),
      method: z.enum(["LRFD", "ASD"]).optional(),
    }),
  z.object({
    ...common,
    material: z.literal("steel-en1993"),
    fy: positive,
    fu: positive,
    E: positive,
    Anet: positive.optional(),
    curve: z.enum(["a0", "a", "b", "c", "d"]),
    gammaM0: positive.optional(),
    gammaM1: positive.optional(),
    gammaM2: positive.optional(),
  }),
  z.object({
    ...common,
    material: z.literal("timber-nds"),
    FcStar: positive,
    FtPrime: positive,
    EminPrime: positive,
    c: z.union([z.enum(["sawn", "round", "glulam"]), positive.max(1)]),
    An: positive.optional(),
  }),
]);

/**
 * Axial check of one truss member: tension when `force` ≥ 0, compression
 * (flexural buckling about the least radius of gyration) otherwise;
 * utilization = |force| / design strength.
 */
export function checkMember(options: CheckMemberOptions): CheckMemberResult {
  const o = parseInput(schema, options);
  switch (o.material) {
    case "steel-aisc360": {
      const u = resolveUnits(o.units, "kip-in");
      return checkAisc360Member(o, resolveMemberSection(o.section, u), u);
    }
    case "steel-en1993": {
      const u = resolveUnits(o.units, "N-mm");
      return checkEn1993Member(o, resolveMemberSection(o.section, u), u);
    }
    case "timber-nds": {
      const u = resolveUnits(o.units, "lb-in");
      return checkNdsMember(o, resolveMemberSection(o.section, u), u);
    }
  }
}
