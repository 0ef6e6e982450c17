import type { NodeViewProps } from "@tiptap/react";
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { CalcProvider, CalcStore } from "@/components/editor/calc-context";
import { DeflectionView } from "@/components/editor/nodes/deflection/deflection-view";
import type { CalcNode } from "@/lib/calcs/calc-types";
import { evaluateCalcs } from "@/lib/calcs/evaluate-calcs";
import { demoCalcs } from "./calcs-fixtures";

/** The node view as the editor mounts it, over the package's live results; only what the view reads is filled in. */
function renderView(calcs: CalcNode[], label: string, editable: boolean): string {
  const c = calcs.find((x) => x.label === label);
  if (!c) throw new Error(`no ${label}`);
  const evaluation = evaluateCalcs({ calcs });
  const props = { node: { attrs: { id: c.id, label: c.label, inputs: c.inputs }, type: { name: c.kind } }, updateAttributes: () => undefined, editor: { isEditable: editable }, selected: false };
  const view = createElement(DeflectionView, props as unknown as NodeViewProps);
  return renderToStaticMarkup(createElement(CalcProvider, { value: { store: new CalcStore(evaluation), editable, unitSystem: "SI" }, children: view }));
}

describe("DeflectionView", () => {
  it("shows the controls, the check, the virtual work table and the comparison", () => {
    const html = renderView(demoCalcs(), "D1", true);
    expect(html.match(/data-testid="deflection-value"/g)?.length).toBe(1);
    expect(html).toContain("Virtual work table (21 members)");
    expect(html).toContain("✓ agrees");
    expect(html).toContain("blank: the truss&#x27;s extent, 24 m");
    expect(html).toMatch(/<option value="360" selected="">L\/360<\/option>/);
    expect(html).toContain("PASS ✓");
  });

  it("renders the same check read-only, with no controls", () => {
    const html = renderView(demoCalcs(), "D1", false);
    expect(html.match(/data-testid="deflection-value"/g)?.length).toBe(1);
    expect(html).not.toMatch(/<(select|input)/);
  });

  it("says on the joint field when the joint is not in the truss", () => {
    const calcs = demoCalcs();
    const d1 = calcs.find((c) => c.label === "D1");
    if (d1) d1.inputs = { ...(d1.inputs as object), joint: "Q9" };
    const html = renderView(calcs, "D1", true);
    expect(html).toMatch(/<option value="Q9" selected="">Q9<\/option>/);
    expect(html).toContain("✕ Joint Q9 is not in the truss.");
    expect(html).not.toContain('data-testid="deflection-value"');
  });
});
