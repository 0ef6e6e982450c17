import type { ReactNodeViewProps } from "@tiptap/react";
import type { ComponentType } from "react";
import type { CalcKind } from "@/lib/calcs/calc-types";
import { GenericCalcView } from "./generic-calc-view";
import { JointView } from "./nodes/joint/joint-view";
import { SectionCutView } from "./nodes/section-cut/section-cut-view";
import { TrussView } from "./nodes/truss/truss-view";

/** The React node view of each calc kind. */
export const calcViews: Record<CalcKind, ComponentType<ReactNodeViewProps>> = {
  truss: TrussView,
  sectionCut: SectionCutView,
  joint: JointView,
  formula: GenericCalcView,
  combinations: GenericCalcView,
  memberDesign: GenericCalcView,
  deflection: GenericCalcView,
};
