import type { CalcKind } from "@/lib/calcs/calc-types";

/** The names the interface uses for calc types (PRODUCT.md vocabulary). */
export const calcKindName: Record<CalcKind, string> = {
  truss: "Truss",
  sectionCut: "Section cut",
  joint: "Joint",
  formula: "Formula",
  combinations: "Combinations",
  memberDesign: "Member design",
  deflection: "Deflection",
};

/** What an author types at the start of a line to insert each calc. */
export const calcCommand: Record<CalcKind, string> = {
  truss: "truss",
  sectionCut: "cut",
  joint: "joint",
  formula: "formula",
  combinations: "combinations",
  memberDesign: "design",
  deflection: "deflection",
};
