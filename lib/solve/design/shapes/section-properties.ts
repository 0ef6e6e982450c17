import { parseInput } from "../parse-input";
import { resolveUnits, unitsOptionSchema, type UnitsOption } from "../unit-labels";
import { angleProperties } from "./angle-properties";
import { channelProperties } from "./channel-properties";
import { chsProperties } from "./chs-properties";
import { doubleAngleProperties } from "./double-angle-properties";
import { rectangleProperties } from "./rectangle-properties";
import { rhsProperties } from "./rhs-properties";
import { roundProperties } from "./round-properties";
import type { SectionProperties } from "./section-result";
import { sectionShapeSchema, type SectionShape } from "./section-shape";
import { withRadii, type SectionCore } from "./with-radii";

/** Options of `sectionProperties` besides the shape: labels for the steps (no default unit). */
export type SectionPropertiesOptions = { units?: UnitsOption };

/** Area, second moments and radii of gyration of a common shape from its dimensions. */
export function sectionProperties(shape: SectionShape, options: SectionPropertiesOptions = {}): SectionProperties {
  const s = parseInput(sectionShapeSchema, shape);
  const u = resolveUnits(parseInput(unitsOptionSchema, options.units), null);
  return withRadii(coreOf(s, u), u);
}

function coreOf(s: SectionShape, u: ReturnType<typeof resolveUnits>): SectionCore {
  switch (s.shape) {
    case "angle":
      return angleProperties(s, u);
    case "double-angle":
      return doubleAngleProperties(s, u);
    case "channel":
      return channelProperties(s, u);
    case "chs":
      return chsProperties(s, u);
    case "rhs":
      return rhsProperties(s, u);
    case "round":
      return roundProperties(s, u);
    case "rectangle":
    case "timber":
      return rectangleProperties(s, u);
  }
}
