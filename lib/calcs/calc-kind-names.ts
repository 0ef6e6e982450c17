import type { CalcKind } from "./calc-types";

/** Each calc kind's name in the interface and in messages (PRODUCT.md vocabulary). */
export const calcKindNames: Record<CalcKind, string> = {
  truss: "Truss",
  sectionCut: "Section cut",
  joint: "Joint",
  formula: "Formula",
  combinations: "Combinations",
  memberDesign: "Member design",
  deflection: "Deflection",
};
