import { z } from "zod";
import { texQty } from "../latex";
import type { Step } from "../types";
import type { MemberSection } from "./check-member-types";
import { sectionProperties } from "./shapes/section-properties";
import { sectionShapeSchema } from "./shapes/section-shape";
import type { ResolvedUnits } from "./unit-labels";

/** zod schema for a member section: a shape or its properties. */
export const memberSectionSchema = z.discriminatedUnion("shape", [
  ...sectionShapeSchema.options,
  z.object({ shape: z.literal("properties"), A: z.number().positive(), rmin: z.number().positive(), d: z.number().positive().optional() }),
]);

/** The properties a member check needs, with the steps that found them. */
export type ResolvedSection = {
  A: number;
  rmin: number;
  /** Least dimension of a rectangular section (timber), when known. */
  leastDimension?: number;
  steps: Step[];
};

/** Area, least radius of gyration and (for rectangles) least dimension of a member section. */
export function resolveMemberSection(section: MemberSection, u: ResolvedUnits): ResolvedSection {
  if (section.shape === "properties") {
    return {
      A: section.A,
      rmin: section.rmin,
      leastDimension: section.d,
      steps: [{ latex: `A = ${texQty(section.A, u.area)},\\quad r_{min} = ${texQty(section.rmin, u.length)}`, text: "Section properties as entered." }],
    };
  }
  const props = sectionProperties(section, { units: { length: u.length } });
  const leastDimension =
    section.shape === "timber"
      ? Math.min(section.b, section.d)
      : section.shape === "rectangle"
        ? Math.min(section.b, section.h)
        : undefined;
  return { A: props.A, rmin: props.rmin, leastDimension, steps: props.steps };
}
