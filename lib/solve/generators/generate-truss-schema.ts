import { z } from "zod";
import type { GenerateTrussOptions, MonoPitchOptions, PitchedOptions, ScissorsOptions } from "./generate-truss-options";
import { resolveRise } from "./resolve-rise";

// Messages leave the field out: invalidFromZod puts the path in front.
const positive = () => z.number({ error: "must be a number" }).refine((v) => Number.isFinite(v) && v > 0, "must be a positive finite number");

const optionalPositive = () => positive().optional();

// Symmetric shapes reverse their web at midspan, so they need a joint there: an even panel count.
const panels = (min: number, even: boolean) =>
  z
    .number({ error: "must be a number" })
    .int("must be a whole number")
    .min(min, `must be at least ${min}`)
    .refine((n) => !even || n % 2 === 0, "must be even for a symmetric shape");

const base = {
  span: positive(),
  A: optionalPositive(),
  E: optionalPositive(),
  units: z
    .strictObject({ length: z.enum(["m", "mm", "ft", "in"]).optional(), force: z.enum(["kN", "N", "kip", "lbf"]).optional() })
    .optional(),
};

const ends = z.enum(["vertical", "inclined"]).optional();
const depth = positive();
const slope = { rise: optionalPositive(), pitch: optionalPositive() };

const pratt = z.strictObject({ ...base, shape: z.enum(["pratt", "howe"]), panels: panels(2, true), depth, ends });
const warren = z.strictObject({ ...base, shape: z.enum(["warren", "warren-verticals"]), panels: panels(2, true), depth });
const k = z.strictObject({ ...base, shape: z.literal("k"), panels: panels(2, true), depth });
const parallel = z
  .strictObject({
    ...base,
    shape: z.literal("parallel-chord"),
    panels: panels(2, true),
    depth,
    web: z.enum(["pratt", "howe", "warren", "warren-verticals", "k"]).optional(),
    ends,
  })
  .refine((o) => o.ends === undefined || o.web === undefined || o.web === "pratt" || o.web === "howe", {
    message: "applies only to the pratt and howe webs",
    path: ["ends"],
  });
const gable = z.strictObject({ ...base, shape: z.enum(["pratt-pitched", "howe-pitched"]), panels: panels(2, true), ...slope });
const finkFan = z.strictObject({ ...base, shape: z.enum(["fink", "fan"]), panels: panels(4, true), ...slope });
const scissors = z.strictObject({
  ...base,
  shape: z.literal("scissors"),
  panels: panels(2, true),
  ...slope,
  bottomRise: optionalPositive(),
  bottomPitch: optionalPositive(),
});
const mono = z.strictObject({ ...base, shape: z.literal("mono-pitch"), panels: panels(1, false), ...slope });

/**
 * Validates `generateTruss` options. Cross-field rules (exactly one of rise /
 * pitch, scissors bottom chord below the top chord) are checked here too, so a
 * parsed value can be built without further checks.
 */
export const generateTrussSchema: z.ZodType<GenerateTrussOptions> = z
  .discriminatedUnion("shape", [pratt, warren, k, parallel, gable, finkFan, scissors, mono])
  .superRefine((o, ctx) => {
    if (!isSloped(o)) return;
    if ((o.rise === undefined) === (o.pitch === undefined)) {
      ctx.addIssue({ code: "custom", path: ["rise"], message: "give exactly one of rise or pitch" });
      return;
    }
    if (o.shape !== "scissors") return;
    if (o.bottomRise !== undefined && o.bottomPitch !== undefined) {
      ctx.addIssue({ code: "custom", path: ["bottomRise"], message: "give at most one of bottomRise or bottomPitch" });
      return;
    }
    const half = o.span / 2;
    const top = resolveRise(o, half);
    const bottom = resolveRise({ rise: o.bottomRise, pitch: o.bottomPitch }, half, top / 2);
    if (bottom >= top) {
      const field = o.bottomPitch !== undefined ? "bottomPitch" : "bottomRise";
      ctx.addIssue({ code: "custom", path: [field], message: "must keep the bottom chord below the top chord" });
    }
  });

const SLOPED: ReadonlySet<string> = new Set(["pratt-pitched", "howe-pitched", "fink", "fan", "scissors", "mono-pitch"]);

function isSloped(o: GenerateTrussOptions): o is PitchedOptions | ScissorsOptions | MonoPitchOptions {
  return SLOPED.has(o.shape);
}
