import type { NodeViewProps } from "@tiptap/react";
import { createElement, type ComponentType } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { CalcProvider, CalcStore } from "@/components/editor/calc-context";
import type { CalcNode, PackageEvaluation } from "@/lib/calcs/calc-types";
import { evaluateCalcs } from "@/lib/calcs/evaluate-calcs";

/**
 * Helpers for the calc view tests: a node view rendered to markup inside a
 * calc context, with the fewest node-view props the views read.
 */

/** Props of a node view for `calc`, recording what it writes. */
export function nodeViewProps(calc: CalcNode, written: unknown[] = [], editable = true): NodeViewProps {
  const props = {
    node: { attrs: { id: calc.id, label: calc.label, inputs: calc.inputs }, type: { name: calc.kind } },
    updateAttributes: (attrs: unknown) => written.push(attrs),
    editor: { isEditable: editable },
    selected: false,
  };
  // The views read only these fields; a whole editor is not needed to render them.
  return props as unknown as NodeViewProps;
}

/** A node view of `calc` rendered with the package evaluated. */
export function renderCalcView(view: ComponentType<NodeViewProps>, calc: CalcNode, calcs: CalcNode[], options: { editable?: boolean; evaluation?: PackageEvaluation } = {}): string {
  const editable = options.editable ?? true;
  const evaluation = options.evaluation ?? evaluateCalcs({ calcs });
  const value = { store: new CalcStore(evaluation), editable, unitSystem: "SI" as const };
  return renderToStaticMarkup(createElement(CalcProvider, { value, children: createElement(view, nodeViewProps(calc, [], editable)) }));
}

