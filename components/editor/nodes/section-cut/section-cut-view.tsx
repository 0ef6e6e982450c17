"use client";

import type { NodeViewProps } from "@tiptap/react";
import type { SectionCutView as SectionCutViewData } from "@/lib/calcs/section-cut/section-cut-view";
import { CalcFrame } from "../../calc-frame";
import { useCalcNode } from "../../use-calc-node";
import { useTrussSources } from "../truss/use-truss-sources";
import { SectionCutBody } from "./section-cut-body";
import { sectionCutSummary } from "./section-cut-summary";

/** The Section cut calc in the editor: method of sections on a Truss calc, checked against its full solution. */
export function SectionCutView(props: NodeViewProps) {
  const calc = useCalcNode<unknown>(props);
  const sources = useTrussSources();
  const view = calc.result?.status === "ok" ? (calc.result.view as SectionCutViewData) : null;
  return (
    <CalcFrame calcId={calc.id} kind="sectionCut" label={calc.label} result={calc.result} editable={calc.editable} selected={props.selected} onRename={calc.rename} summary={sectionCutSummary(view)}>
      <SectionCutBody label={calc.label} inputs={calc.inputs} result={calc.result} sources={sources} editable={calc.editable} setInputs={calc.setInputs} />
    </CalcFrame>
  );
}
