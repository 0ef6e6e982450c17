import type { NodeViewProps } from "@tiptap/react";
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { CalcProvider, CalcStore } from "@/components/editor/calc-context";
import { CombinationsView } from "@/components/editor/nodes/combinations/combinations-view";
import type { CalcNode } from "@/lib/calcs/calc-types";
import { evaluateCalcs } from "@/lib/calcs/evaluate-calcs";
import { demoCalcs } from "./calcs-fixtures";

/** The node view as the editor mounts it, over the package's live results; only what the view reads is filled in. */
function renderView(calcs: CalcNode[], label: string, editable: boolean): string {
  const c = calcs.find((x) => x.label === label);
  if (!c) throw new Error(`no ${label}`);
  const evaluation = evaluateCalcs({ calcs });
  const props = { node: { attrs: { id: c.id, label: c.label, inputs: c.inputs }, type: { name: c.kind } }, updateAttributes: () => undefined, editor: { isEditable: editable }, selected: false };
  const view = createElement(CombinationsView, props as unknown as NodeViewProps);
  return renderToStaticMarkup(createElement(CalcProvider, { value: { store: new CalcStore(evaluation), editable, unitSystem: "SI" }, children: view }));
}

describe("CombinationsView", () => {
  it("shows the set, the cases, the combinations and the governing combination per member", () => {
    const html = renderView(demoCalcs(), "C1", true);
    expect(html.match(/data-testid="governing"/g)?.length).toBe(21);
    expect(html.match(/data-testid="combination"/g)?.length).toBe(2);
    expect(html).toContain("EN 1990 Eq. 6.10, STR/GEO set B");
    expect(html).toContain('aria-label="ψ0 of load case Q"');
    expect(html).toContain("largest member force U2U3");
  });

  it("renders the same tables read-only, with no controls", () => {
    const html = renderView(demoCalcs(), "C1", false);
    expect(html.match(/data-testid="governing"/g)?.length).toBe(21);
    expect(html).not.toMatch(/<(select|input)/);
  });

  it("flags case kinds a published set does not combine, and says so on the set", () => {
    const calcs = demoCalcs();
    const c1 = calcs.find((c) => c.label === "C1");
    if (c1) c1.inputs = { truss: "T1", standard: "ASCE7-16-LRFD" };
    const html = renderView(calcs, "C1", true);
    expect(html).toContain("✕ not a kind ASCE/SEI 7-16 strength design (LRFD), §2.3.1 combines");
    expect(html).toMatch(/aria-invalid="true"[^>]*>[\s\S]*Load case G of T1 is of kind/);
  });

  it("offers a factor table for custom combinations", () => {
    const calcs = demoCalcs();
    const c1 = calcs.find((c) => c.label === "C1");
    if (c1) c1.inputs = { truss: "T1", standard: "custom", custom: [{ name: "SLS", factors: { G: 1, Q: 1 } }] };
    const html = renderView(calcs, "C1", true);
    expect(html).toContain('aria-label="Custom factor sets"');
    expect(html).toContain('aria-label="γ Q, combination SLS"');
    expect(html.match(/data-testid="governing"/g)?.length).toBe(21);
  });
});
