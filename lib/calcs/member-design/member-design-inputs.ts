import { z } from "zod";
import { calcLabelSchema } from "../calc-label";
import { memberSectionInput } from "./member-section-input";

const positive = z.number().positive();
const MAX_ROWS = 2000;

/** What every row names: the member, its section, and K (default 1.0, pin-ended). */
const row = { member: z.string().min(1).max(40), section: memberSectionInput, K: positive.optional() };

/** Steel to AISC 360-16 ch. D and E: Fy, Fu, E in ksi (US trusses) or MPa (SI trusses). */
const aiscRow = z.strictObject({
  ...row,
  Fy: positive,
  Fu: positive,
  E: positive,
  An: positive.optional(),
  U: positive.max(1).optional(),
  method: z.enum(["LRFD", "ASD"]).optional(),
});

/** Steel to EN 1993-1-1 §6.2.3 and §6.3.1: fy, fu, E in MPa (SI) or ksi (US); buckling curve a0–d. */
const en1993Row = z.strictObject({
  ...row,
  fy: positive,
  fu: positive,
  E: positive,
  Anet: positive.optional(),
  curve: z.enum(["a0", "a", "b", "c", "d"]),
  gammaM0: positive.optional(),
  gammaM1: positive.optional(),
  gammaM2: positive.optional(),
});

/** Timber to NDS 2018 §3.6–3.8: adjusted values Fc*, F't, E'min in psi (US) or MPa (SI); c for the column stability factor. */
const ndsRow = z.strictObject({
  ...row,
  FcStar: positive,
  FtPrime: positive,
  EminPrime: positive,
  c: z.union([z.enum(["sawn", "round", "glulam"]), positive.max(1)]),
  An: positive.optional(),
});

const common = {
  truss: calcLabelSchema,
  /**
   * Where the member forces come from: the label of a Combinations calc (each
   * member checked for its governing tension and compression), or a load case
   * or combination of the truss; empty means the truss's first case.
   */
  source: z.string().max(120).default(""),
};

/**
 * Inputs of a Member design calc: the truss whose geometry gives each
 * member's length, the source of the forces, the material standard, and one
 * row per member checked. Sections and stresses are in N, mm, MPa for SI
 * trusses; kip, in, ksi (steel) or lbf, in, psi (timber) for US ones.
 */
export const memberDesignInputs = z.discriminatedUnion("material", [
  z.strictObject({ ...common, material: z.literal("steel-aisc360"), members: z.array(aiscRow).max(MAX_ROWS) }),
  z.strictObject({ ...common, material: z.literal("steel-en1993"), members: z.array(en1993Row).max(MAX_ROWS) }),
  z.strictObject({ ...common, material: z.literal("timber-nds"), members: z.array(ndsRow).max(MAX_ROWS) }),
]);

/** Parsed inputs of a Member design calc. */
export type MemberDesignInputs = z.infer<typeof memberDesignInputs>;

/** A new Member design calc: T1's top chord member U1U2 as a 100×100×5 RHS in S355 to EN 1993-1-1. */
export function memberDesignDefaults(): MemberDesignInputs {
  return {
    truss: "T1",
    source: "",
    material: "steel-en1993",
    members: [{ member: "U1U2", section: { shape: "rhs", b: 100, h: 100, t: 5 }, fy: 355, fu: 490, E: 210000, curve: "a" }],
  };
}
