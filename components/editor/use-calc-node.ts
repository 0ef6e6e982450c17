"use client";

import type { NodeViewProps } from "@tiptap/react";
import { useCallback } from "react";
import type { CalcResult } from "@/lib/calcs/calc-types";
import { useCalcContext, useCalcResult } from "./calc-context";

/** What every calc node view needs: its inputs, a way to change them, its derived result, and whether it may edit. */
export function useCalcNode<I>(props: NodeViewProps): {
  id: string;
  label: string;
  inputs: I;
  result: CalcResult | undefined;
  editable: boolean;
  setInputs: (next: I) => void;
  rename: (label: string) => void;
} {
  const { editable } = useCalcContext();
  const id = String(props.node.attrs.id);
  const result = useCalcResult(id);
  const { updateAttributes } = props;
  const setInputs = useCallback((next: I) => updateAttributes({ inputs: next }), [updateAttributes]);
  const rename = useCallback((label: string) => updateAttributes({ label }), [updateAttributes]);
  return { id, label: String(props.node.attrs.label), inputs: props.node.attrs.inputs as I, result, editable: editable && props.editor.isEditable, setInputs, rename };
}
