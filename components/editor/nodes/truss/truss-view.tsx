"use client";

import type { NodeViewProps } from "@tiptap/react";
import type { TrussView as TrussViewData } from "@/lib/calcs/truss/truss-view";
import { useCalcContext } from "../../calc-context";
import { CalcFrame } from "../../calc-frame";
import { useCalcNode } from "../../use-calc-node";
import { TrussBody } from "./truss-body";
import { trussSummary } from "./truss-summary";

/** The Truss calc in the editor: editable tables, the diagram to scale, and results per case. */
export function TrussView(props: NodeViewProps) {
  const calc = useCalcNode<unknown>(props);
  const { unitSystem } = useCalcContext();
  const summary = calc.result ? trussSummary((calc.result.view ?? null) as TrussViewData | null) : undefined;
  return (
    <CalcFrame calcId={calc.id} kind="truss" label={calc.label} result={calc.result} editable={calc.editable} selected={props.selected} onRename={calc.rename} summary={summary}>
      <TrussBody label={calc.label} inputs={calc.inputs} result={calc.result} editable={calc.editable} packageSystem={unitSystem} setInputs={calc.setInputs} />
    </CalcFrame>
  );
}
