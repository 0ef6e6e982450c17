import type { ReactNodeViewProps } from "@tiptap/react";
import type { ComponentType } from "react";
import type { CalcKind } from "@/lib/calcs/calc-types";
import { CombinationsView } from "./nodes/combinations/combinations-view";
import { DeflectionView } from "./nodes/deflection/deflection-view";
import { FormulaView } from "./nodes/formula/formula-view";
import { JointView } from "./nodes/joint/joint-view";
import { MemberDesignView } from "./nodes/member-design/member-design-view";
import { SectionCutView } from "./nodes/section-cut/section-cut-view";
import { TrussView } from "./nodes/truss/truss-view";

/** The React node view of each calc kind. */
export const calcViews: Record<CalcKind, ComponentType<ReactNodeViewProps>> = {
  truss: TrussView,
  sectionCut: SectionCutView,
  joint: JointView,
  formula: FormulaView,
  combinations: CombinationsView,
  memberDesign: MemberDesignView,
  deflection: DeflectionView,
};
