import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { CutAgreementLine } from "@/components/editor/nodes/section-cut/cut-agreement-line";
import { CutForcesTable } from "@/components/editor/nodes/section-cut/cut-forces-table";
import { SectionCutView } from "@/components/editor/nodes/section-cut/section-cut-view";
import type { CalcNode } from "@/lib/calcs/calc-types";
import type { SectionCutView as SectionCutViewData } from "@/lib/calcs/section-cut/section-cut-view";
import { evaluateCalcs } from "@/lib/calcs/evaluate-calcs";
import { demoCalc, demoCalcs, resultOf } from "./calcs-fixtures";
import { renderCalcView } from "./view-truss-fixtures";

const withS1 = (inputs: unknown): CalcNode[] => demoCalcs().map((c) => (c.label === "S1" ? { ...c, inputs } : c));

describe("SectionCutView", () => {
  const calcs = demoCalcs();
  const html = renderCalcView(SectionCutView, demoCalc("S1", calcs), calcs);

  it("picks the truss and the case from the package's truss calcs", () => {
    expect(html).toContain('<option value="T1" selected="">T1 (Truss)</option>');
    expect(html).toContain('<option value="C1">C1 (Combinations)</option>');
    expect(html).toContain('<option value="Q" selected="">Q</option>');
  });

  it("draws the free body with the cut members pressable on the diagram and ticked in the list", () => {
    expect(html).toContain('data-testid="free-body-diagram"');
    expect(html).toMatch(/<g data-member="U2U3"[^>]*role="button"[^>]*aria-pressed="true"/);
    expect(html).toMatch(/<g data-member="U1U2"[^>]*aria-pressed="false"/);
    expect(html).toContain("Members cut (3 of 3 at most)");
    expect(html).toContain("free body: <span class=\"pp-num\">L0, L1, L2, U1, U2</span>");
    expect(html).toContain("Keep the other side");
  });

  it("gives each cut force with how it was found, its sense and the full solution beside it", () => {
    expect(html).toMatch(/<tr data-testid="cut-force" data-member="U2U3" data-value="-149\.99\d*" data-sense="compression" data-agrees="true">.*?Moments about joint L3.*?−150<\/td><td class="text-compression">compression \(C\)<\/td><td class="text-ink-soft">✓ Agrees with the stiffness solution within round-off<\/td>/);
    expect(html).toMatch(/data-member="U2L3".*?Force sum across the two parallel members.*?20\.83.*?tension \(T\)/);
    expect(html).toMatch(/data-member="L2L3".*?Moments about joint U2/);
    expect(html).toContain("✓ Agrees with the stiffness solution of T1 within round-off.");
  });

  it("shows every equation of the working as typeset math", () => {
    expect(html).toContain('data-step="4"');
    expect(html).toContain("Moments about joint L3 (on the removed side)");
    expect(html).toContain('data-testid="calc-summary">U2U3 = −150 kN (C) · U2L3 = 20.83 kN (T) · L2L3 = 133.3 kN (T) · agrees with T1</footer>');
  });

  it("with no members given, uses the proposed cut through the panel and offers the alternatives", () => {
    const proposed = withS1({ truss: "T1", loadCase: "Q", members: [], keep: "", panel: 1 });
    const out = renderCalcView(SectionCutView, demoCalc("S1", proposed), proposed);
    expect(out).toContain("Proposed cut: Cut ");
    expect(out).toContain('<option value="1" selected="">panel 1 (L1L2, x 4 to 8)</option>');
    expect(out).toMatch(/<button[^>]*>Use<\/button><span>Cut /);
    expect(out).toContain('data-testid="cut-force"');
  });

  it("names a truss the package does not have, on its field", () => {
    const missing = withS1({ truss: "T9", loadCase: "", members: [], keep: "" });
    const out = renderCalcView(SectionCutView, demoCalc("S1", missing), missing);
    expect(out).toContain('<option value="T9" selected="">T9 (not in this package)</option>');
    expect(out).not.toContain('data-testid="free-body-diagram"');
  });

  it("read-only, shows the same cut without controls to change it", () => {
    const out = renderCalcView(SectionCutView, demoCalc("S1", calcs), calcs, { editable: false });
    expect(out).not.toContain('role="button"');
    expect(out).not.toContain("Keep the other side");
    expect(out).toContain('data-testid="cut-force"');
  });
});

describe("a cut that disagrees with the full solution", () => {
  it("is flagged on the member and in the verdict, in words and with a mark", () => {
    const view = resultOf(evaluateCalcs({ calcs: demoCalcs() }), "S1").view as SectionCutViewData;
    const off: SectionCutViewData = { ...view, agrees: false, rows: view.rows.map((r, i) => (i === 0 ? { ...r, force: r.force + 10, agrees: false } : r)) };
    const html = renderToStaticMarkup(createElement("div", null, createElement(CutForcesTable, { view: off }), createElement(CutAgreementLine, { view: off })));
    expect(html).toContain('data-agrees="false"');
    expect(html).toContain("✕ Differs by 10 kN from the stiffness solution (−150 kN)");
    expect(html).toContain('role="alert">✕ Differs from the stiffness solution of T1');
  });
});
