import type { ReactNodeViewProps } from "@tiptap/react";
import type { ComponentType } from "react";
import type { CalcKind } from "@/lib/calcs/calc-types";
import { GenericCalcView } from "./generic-calc-view";

/** The React node view of each calc kind. */
export const calcViews: Record<CalcKind, ComponentType<ReactNodeViewProps>> = {
  truss: GenericCalcView,
  sectionCut: GenericCalcView,
  joint: GenericCalcView,
  formula: GenericCalcView,
  combinations: GenericCalcView,
  memberDesign: GenericCalcView,
  deflection: GenericCalcView,
};
