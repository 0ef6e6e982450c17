import { z } from "zod";

const positive = z.number().positive();

/** Angle: leg `d` vertical (along y), leg `b` horizontal (along x), thickness t. Root and toe radii ignored. */
export type AngleShape = { shape: "angle"; d: number; b: number; t: number };
/** Two angles with their `d` legs back to back, `gap` apart (gusset thickness); symmetric about y. */
export type DoubleAngleShape = { shape: "double-angle"; d: number; b: number; t: number; gap: number };
/** Channel: depth d (along y), flange width bf, flange thickness tf (parallel flanges), web thickness tw. */
export type ChannelShape = { shape: "channel"; d: number; bf: number; tf: number; tw: number };
/** Circular hollow section (pipe, round HSS): outside diameter D, wall t (design thickness). */
export type ChsShape = { shape: "chs"; D: number; t: number };
/**
 * Rectangular hollow section: width b (along x), height h (along y), wall t.
 * `cornerRadius` is the outside corner radius; omitted means sharp corners.
 */
export type RhsShape = { shape: "rhs"; b: number; h: number; t: number; cornerRadius?: number };
/** Solid round bar or rod, diameter D. */
export type RoundShape = { shape: "round"; D: number };
/** Solid rectangle: width b (along x), height h (along y). */
export type RectangleShape = { shape: "rectangle"; b: number; h: number };
/** Sawn lumber or glulam, actual (dressed) breadth b (along x) and depth d (along y). */
export type TimberShape = { shape: "timber"; b: number; d: number; product?: "sawn" | "glulam" };

/** A cross-section given by the dimensions of a common shape, one length unit throughout. */
export type SectionShape =
  | AngleShape
  | DoubleAngleShape
  | ChannelShape
  | ChsShape
  | RhsShape
  | RoundShape
  | RectangleShape
  | TimberShape;

/** zod schema for every shape; geometric consistency (walls thinner than the section) is checked here too. */
export const sectionShapeSchema = z.discriminatedUnion("shape", [
  z
    .object({ shape: z.literal("angle"), d: positive, b: positive, t: positive })
    .refine((s) => s.t < Math.min(s.b, s.d), { path: ["t"], message: "thickness t must be less than both legs" }),
  z
    .object({ shape: z.literal("double-angle"), d: positive, b: positive, t: positive, gap: z.number().nonnegative() })
    .refine((s) => s.t < Math.min(s.b, s.d), { path: ["t"], message: "thickness t must be less than both legs" }),
  z
    .object({ shape: z.literal("channel"), d: positive, bf: positive, tf: positive, tw: positive })
    .refine((s) => 2 * s.tf < s.d, { path: ["tf"], message: "two flange thicknesses must be less than the depth d" })
    .refine((s) => s.tw < s.bf, { path: ["tw"], message: "web thickness tw must be less than the flange width bf" }),
  z
    .object({ shape: z.literal("chs"), D: positive, t: positive })
    .refine((s) => 2 * s.t <= s.D, { path: ["t"], message: "wall t must not exceed half the diameter D" }),
  z
    .object({ shape: z.literal("rhs"), b: positive, h: positive, t: positive, cornerRadius: z.number().nonnegative().optional() })
    .refine((s) => 2 * s.t < Math.min(s.b, s.h), { path: ["t"], message: "two walls must be thinner than both b and h" })
    .refine((s) => (s.cornerRadius ?? 0) <= Math.min(s.b, s.h) / 2, {
      path: ["cornerRadius"],
      message: "corner radius must not exceed half the smaller side",
    }),
  z.object({ shape: z.literal("round"), D: positive }),
  z.object({ shape: z.literal("rectangle"), b: positive, h: positive }),
  z.object({ shape: z.literal("timber"), b: positive, d: positive, product: z.enum(["sawn", "glulam"]).optional() }),
]);
