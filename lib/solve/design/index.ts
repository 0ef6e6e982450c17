/**
 * Member design: steel to AISC 360-16 (chapters D, E) and EN 1993-1-1:2005
 * (§6.2.3, §6.3.1), timber column stability to NDS 2018 §3.7, section
 * properties of common shapes, and the axial member check the Member design
 * calc uses.
 */
import { aisc360Compression } from "./aisc360-compression";
import { aisc360Tension } from "./aisc360-tension";
import { en1993BucklingReduction } from "./en1993-buckling-reduction";
import { en1993CompressionResistance } from "./en1993-compression-resistance";
import { en1993TensionResistance } from "./en1993-tension-resistance";
import { ndsColumnStability } from "./nds-column-stability";

/** AISC 360-16: tension (§D2, §D3) and flexural buckling stress (§E3). */
export const aisc360 = { tension: aisc360Tension, compression: aisc360Compression } as const;

/** EN 1993-1-1:2005: buckling reduction χ (§6.3.1.2), tension (§6.2.3) and buckling (§6.3.1) resistance. */
export const en1993 = {
  bucklingReduction: en1993BucklingReduction,
  tensionResistance: en1993TensionResistance,
  compressionResistance: en1993CompressionResistance,
} as const;

/** NDS 2018: column stability factor (§3.7.1). */
export const nds = { columnStability: ndsColumnStability } as const;

export { AISC360_16 } from "./aisc360-factors";
export { checkMember } from "./check-member";
export { eulerLoad } from "./euler-load";
export { imperfectionFactors, EN1993_RECOMMENDED_GAMMA } from "./en1993-imperfection-factors";
export { ndsColumnParameter } from "./nds-column-stability";
export { sectionProperties } from "./shapes/section-properties";

export type { Aisc360CompressionOptions, Aisc360CompressionResult } from "./aisc360-compression";
export type { Aisc360TensionOptions, Aisc360TensionResult } from "./aisc360-tension";
export type {
  CheckAisc360Member,
  CheckEn1993Member,
  CheckMemberOptions,
  CheckMemberResult,
  CheckNdsMember,
  MemberSection,
  SectionByProperties,
} from "./check-member-types";
export type { BucklingCurve } from "./en1993-imperfection-factors";
export type { En1993BucklingReductionOptions, En1993BucklingReductionResult } from "./en1993-buckling-reduction";
export type { En1993CompressionResistanceOptions, En1993CompressionResistanceResult } from "./en1993-compression-resistance";
export type { En1993TensionResistanceOptions, En1993TensionResistanceResult } from "./en1993-tension-resistance";
export type { EulerLoadOptions } from "./euler-load";
export type { NdsColumnParameter, NdsColumnStabilityOptions, NdsColumnStabilityResult } from "./nds-column-stability";
export type { SectionPropertiesOptions } from "./shapes/section-properties";
export type { SectionProperties } from "./shapes/section-result";
export type {
  AngleShape,
  ChannelShape,
  ChsShape,
  DoubleAngleShape,
  RectangleShape,
  RhsShape,
  RoundShape,
  SectionShape,
  TimberShape,
} from "./shapes/section-shape";
export type { UnitLabels, UnitSystem, UnitsOption } from "./unit-labels";
