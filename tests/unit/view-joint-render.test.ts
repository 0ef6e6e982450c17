import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { JointOutcome } from "@/components/editor/nodes/joint/joint-outcome";
import { JointView } from "@/components/editor/nodes/joint/joint-view";
import { KnownForcesTable } from "@/components/editor/nodes/joint/known-forces-table";
import type { CalcNode } from "@/lib/calcs/calc-types";
import type { SingleJointView } from "@/lib/calcs/joint/joint-view";
import { demoCalc, demoCalcs } from "./calcs-fixtures";
import { renderCalcView } from "./view-truss-fixtures";

const withJ1 = (inputs: unknown): CalcNode[] => demoCalcs().map((c) => (c.label === "J1" ? { ...c, inputs } : c));

describe("JointView", () => {
  const calcs = demoCalcs();
  const html = renderCalcView(JointView, demoCalc("J1", calcs), calcs);

  it("picks the truss, the case and one joint, or the whole truss in order", () => {
    expect(html).toContain('<option value="T1" selected="">T1 (Truss)</option>');
    expect(html).toContain('<select aria-label="Joint"');
    expect(html).toContain('<option value="L0" selected="">L0</option>');
    expect(html).toContain("Every joint, in a solvable order");
  });

  it("writes ΣFx and ΣFy as typeset math and tables the unknowns with T or C", () => {
    expect(html).toContain("Equilibrium, ΣFx = 0 and ΣFy = 0");
    expect(html).toContain("Sum of horizontal forces at L0, positive to the right.");
    expect(html).toMatch(/<tr data-testid="joint-force" data-member="L0U1"[^>]*data-sense="compression"[^>]*>.*?−104\.2<\/td><td class="text-compression">compression \(C\)<\/td>/);
    expect(html).toMatch(/<tr data-testid="joint-force" data-member="L0L1"[^>]*>.*?83\.33<\/td><td class="text-tension">tension \(T\)<\/td>/);
    expect(html).toContain("✓ Joint L0 balances: ΣFx = ΣFy = 0 with every force in.");
  });

  it("lists zero-force members by inspection with the rule and the joint that show each", () => {
    expect(html).toContain('<li data-member="U3L3" data-rule="2">');
    expect(html).toContain("Rule 2: three members, two in line, at an unloaded joint (U3)");
  });

  it("carries known forces in from its table", () => {
    const known = withJ1({ truss: "T1", loadCase: "Q", joint: "L1", known: { L0L1: 83.333333333333 }, sequence: false });
    const out = renderCalcView(JointView, demoCalc("J1", known), known);
    expect(out).toContain('aria-label="Member, known force L0L1"');
    expect(out).toMatch(/data-testid="joint-force" data-member="L1L2"/);
  });

  it("in sequence, shows the order the joints were solved in", () => {
    const seq = withJ1({ truss: "T1", loadCase: "G", sequence: true });
    const out = renderCalcView(JointView, demoCalc("J1", seq), seq);
    expect(out).toMatch(/Solved in order: <span class="pp-num">L0 → [^<]+<\/span>/);
    expect(out).toContain('<select aria-label="Joint" class="pp-input w-auto py-0.5" disabled=""');
  });

  it("read-only, shows the working without controls", () => {
    const out = renderCalcView(JointView, demoCalc("J1", calcs), calcs, { editable: false });
    expect(out).not.toContain("Add known force");
    expect(out).toContain("None: every member force at the joint is found here.");
    expect(out).toContain('data-testid="joint-force"');
  });
});

describe("JointOutcome", () => {
  it("flags a joint that does not balance with the known forces, with the residuals", () => {
    const view: SingleJointView = { mode: "joint", truss: "T1", loadCase: "Q", joint: "L1", rows: [], known: { L0L1: 10 }, residual: { x: -73.3, y: 0 }, balanced: false, agrees: false, units: { force: "kN" } };
    const html = renderToStaticMarkup(createElement(JointOutcome, { view }));
    expect(html).toContain("✕ Joint L1 does not balance with the known forces: ΣFx = −73.3 kN, ΣFy = 0 kN.");
    expect(html).toContain("✕ Differs from the stiffness solution of T1; see the table.");
  });
});

describe("KnownForcesTable", () => {
  it("labels each known force by its member and unit", () => {
    const html = renderToStaticMarkup(createElement(KnownForcesTable, { known: { L0L1: 83.3 }, unit: "kN", readOnly: false, onChange: () => undefined }));
    expect(html).toContain('aria-label="N (kN), known force L0L1"');
    expect(html).toContain('value="83.3"');
  });
});
