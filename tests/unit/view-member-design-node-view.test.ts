import type { NodeViewProps } from "@tiptap/react";
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { CalcProvider, CalcStore } from "@/components/editor/calc-context";
import { MemberDesignView } from "@/components/editor/nodes/member-design/member-design-view";
import type { CalcNode } from "@/lib/calcs/calc-types";
import { evaluateCalcs } from "@/lib/calcs/evaluate-calcs";
import { demoCalcs } from "./calcs-fixtures";

/** The node view as the editor mounts it, over the package's live results; only what the view reads is filled in. */
function renderView(calcs: CalcNode[], label: string, editable: boolean): string {
  const c = calcs.find((x) => x.label === label);
  if (!c) throw new Error(`no ${label}`);
  const evaluation = evaluateCalcs({ calcs });
  const props = { node: { attrs: { id: c.id, label: c.label, inputs: c.inputs }, type: { name: c.kind } }, updateAttributes: () => undefined, editor: { isEditable: editable }, selected: false };
  const view = createElement(MemberDesignView, props as unknown as NodeViewProps);
  return renderToStaticMarkup(createElement(CalcProvider, { value: { store: new CalcStore(evaluation), editable, unitSystem: "SI" }, children: view }));
}

describe("MemberDesignView", () => {
  it("shows the members, their utilization with PASS and the working per member", () => {
    const html = renderView(demoCalcs(), "M1", true);
    expect(html.match(/data-testid="utilization"/g)?.length).toBe(9);
    expect(html.match(/data-testid="utilization-value"/g)?.length).toBe(9);
    expect(html).toContain("forces from combinations C1");
    expect(html).toContain("All 9 members PASS ✓");
    expect(html).toContain("Working per member");
    expect(html).toContain("+ Add member");
  });

  it("renders the same rows and tables read-only, with no controls", () => {
    const html = renderView(demoCalcs(), "M1", false);
    expect(html.match(/data-testid="utilization"/g)?.length).toBe(9);
    expect(html).not.toMatch(/<(select|input)/);
    expect(html).not.toContain("Add member");
  });

  it("shows a problem on its field and lists a field the form does not know", () => {
    const calcs = demoCalcs();
    const m1 = calcs.find((c) => c.label === "M1");
    const inputs = m1?.inputs as { members: Record<string, unknown>[] };
    delete inputs.members[0].fy;
    inputs.members[1].colour = "red";
    const html = renderView(calcs, "M1", true);
    expect(html).toMatch(/aria-label="yield strength fy \(MPa\), member U1U2" aria-invalid="true"/);
    expect(html).toContain("members[1].colour</span>: is not a field of this calc");
  });
});
