"use client";

import type { NodeViewProps } from "@tiptap/react";
import type { JointView as JointViewData } from "@/lib/calcs/joint/joint-view";
import { CalcFrame } from "../../calc-frame";
import { useCalcNode } from "../../use-calc-node";
import { useTrussSources } from "../truss/use-truss-sources";
import { JointBody } from "./joint-body";
import { jointSummary } from "./joint-summary";

/** The Joint calc in the editor: method of joints on a Truss calc, at one joint or in sequence. */
export function JointView(props: NodeViewProps) {
  const calc = useCalcNode<unknown>(props);
  const sources = useTrussSources();
  const view = calc.result?.status === "ok" ? (calc.result.view as JointViewData) : null;
  return (
    <CalcFrame calcId={calc.id} kind="joint" label={calc.label} result={calc.result} editable={calc.editable} selected={props.selected} onRename={calc.rename} summary={jointSummary(view)}>
      <JointBody label={calc.label} inputs={calc.inputs} result={calc.result} sources={sources} editable={calc.editable} setInputs={calc.setInputs} />
    </CalcFrame>
  );
}
