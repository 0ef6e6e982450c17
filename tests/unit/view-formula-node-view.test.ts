import type { NodeViewProps } from "@tiptap/react";
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { CalcProvider, CalcStore } from "@/components/editor/calc-context";
import { FormulaView } from "@/components/editor/nodes/formula/formula-view";
import type { CalcNode } from "@/lib/calcs/calc-types";
import { evaluateCalcs } from "@/lib/calcs/evaluate-calcs";
import { demoCalcs } from "./calcs-fixtures";

/** The node view as the editor mounts it, over the package's live results; only what the view reads is filled in. */
function renderView(calcs: CalcNode[], label: string, editable: boolean): string {
  const c = calcs.find((x) => x.label === label);
  if (!c) throw new Error(`no ${label}`);
  const evaluation = evaluateCalcs({ calcs });
  const props = { node: { attrs: { id: c.id, label: c.label, inputs: c.inputs }, type: { name: c.kind } }, updateAttributes: () => undefined, editor: { isEditable: editable }, selected: false };
  const view = createElement(FormulaView, props as unknown as NodeViewProps);
  return renderToStaticMarkup(createElement(CalcProvider, { value: { store: new CalcStore(evaluation), editable, unitSystem: "SI" }, children: view }));
}

describe("FormulaView", () => {
  it("shows the demo formula's lines live from the section cut and the truss", () => {
    const html = renderView(demoCalcs(), "F1", true);
    expect(html.match(/data-testid="formula-line"/g)?.length).toBe(5);
    expect(html).toContain('data-name="N_Q"');
    expect(html).toContain("5 values");
    expect(html).toContain("<textarea");
  });

  it("renders the same lines read-only, without the syntax hint", () => {
    const html = renderView(demoCalcs(), "F1", false);
    expect(html.match(/data-testid="formula-line"/g)?.length).toBe(5);
    expect(html).toContain("readOnly");
    expect(html).not.toContain("<select");
    expect(html).not.toContain("One value per line");
  });

  it("shows a line's problem on that line and keeps the others", () => {
    const calcs = demoCalcs();
    const f1 = calcs.find((c) => c.label === "F1");
    if (f1) f1.inputs = { source: "a = 3 m\nb = a *\nc = a * 2", preferredUnits: "SI" };
    const html = renderView(calcs, "F1", true);
    expect(html).toContain("Line 2: cannot read the expression");
    expect(html).toMatch(/data-name="c"[\s\S]*data-testid="formula-value"[^>]*>6 m</);
    expect(html).toContain("2 values; line 2 has a problem");
  });

  it("opens on unreadable inputs and lists the problem", () => {
    const calcs = demoCalcs();
    const f1 = calcs.find((c) => c.label === "F1");
    if (f1) f1.inputs = null;
    expect(renderView(calcs, "F1", true)).toContain("✕ Inputs: must be a group of fields");
  });
});
