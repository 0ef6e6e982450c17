import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { GeneratorPanel } from "@/components/editor/nodes/truss/generator-panel";
import { LoadsPanel } from "@/components/editor/nodes/truss/loads-panel";
import { trussColumns } from "@/components/editor/nodes/truss/truss-columns";
import { readTrussDraft } from "@/components/editor/nodes/truss/truss-draft";
import { trussUnitText } from "@/components/editor/nodes/truss/truss-unit-text";
import { TrussView } from "@/components/editor/nodes/truss/truss-view";
import type { CalcNode } from "@/lib/calcs/calc-types";
import { demoCalc, demoCalcs } from "./calcs-fixtures";
import { renderCalcView } from "./view-truss-fixtures";

const withInputs = (calcs: CalcNode[], label: string, change: (inputs: Record<string, unknown>) => void) =>
  calcs.map((c) => {
    if (c.label !== label) return c;
    const inputs = structuredClone(c.inputs) as Record<string, unknown>;
    change(inputs);
    return { ...c, inputs };
  });

describe("TrussView", () => {
  const calcs = demoCalcs();
  const html = renderCalcView(TrussView, demoCalc("T1", calcs), calcs);

  it("shows the units line and the unit of every value in its column header", () => {
    expect(html).toContain("lengths m · forces kN · areas mm² · moduli GPa · line loads kN/m");
    expect(html).toContain('x<span class="normal-case tracking-normal text-ink-faint"> (m)</span>');
    expect(html).toContain('aria-label="x (m), joint L1"');
  });

  it("offers the inputs as tabs, joints first, with a CSV import", () => {
    expect(html).toContain('role="tablist" aria-label="Inputs of T1"');
    for (const tab of ["Joints (12)", "Members (21)", "Supports (2)", "Loads (2 cases)", "Shape generator"]) expect(html).toContain(`>${tab}</button>`);
    expect(html).toContain("Import joints from CSV (replaces the table)");
  });

  it("draws the diagram for the first case and states determinacy and stability in words", () => {
    expect(html).toContain('data-testid="truss-diagram" data-case="G" data-solved="true"');
    expect(html).toContain("✓ Stable and statically determinate: m + r = 2j (21 + 3 = 2 × 12)");
    expect(html).toContain("Diagram legend");
  });

  it("tables the case's member forces with T or C in words and the value in a force cell", () => {
    // G, 3 kN/m: U2U3 = M(L3)/d = 3 × 24²/8 / 3 = 72 kN compression (statics).
    expect(html).toMatch(/<tr data-member="U2U3" data-sense="compression">.*?<td class="pp-num text-right" data-testid="force" data-value="-71\.99\d*">−72<\/td><td class="text-compression">compression \(C\)<\/td>/);
    expect(html).toContain('data-testid="member-forces" data-case="G"');
    expect(html).toMatch(/data-testid="reactions" data-case="G">.*?<tr data-joint="L0">.*?<td class="pp-num text-right">36<\/td>/);
  });

  it("shows the global equilibrium steps and the summary line", () => {
    expect(html).toContain("Reactions by global equilibrium, case G");
    expect(html).toContain('data-testid="calc-summary">Stable, determinate · max tension 133.3 kN (L2L3) · max compression −150 kN (U2U3) in case Q</footer>');
  });

  it("marks the wrong field, and says which member it cannot draw", () => {
    const broken = withInputs(calcs, "T1", (i) => {
      (i.members as { end: string }[])[3].end = "X9";
    });
    const out = renderCalcView(TrussView, demoCalc("T1", broken), broken);
    expect(out).toContain("Members (21)<span class=\"ml-1.5 text-xs text-compression\">✕ 1 problem</span>");
    expect(out).toContain('data-solved="false"');
    expect(out).toContain("Not drawn (joint missing or both ends at one point): L3L4.");
    expect(out).toContain("Not solved: fix the marked inputs first.");
  });

  it("marks a drawn member or joint whose input is wrong, in the drawing as well as the table", () => {
    // The runtime reports the first problem it meets, so each is tried on its own.
    const badArea = withInputs(calcs, "T1", (i) => {
      (i.members as { A: number }[])[2].A = -5;
    });
    const member = renderCalcView(TrussView, demoCalc("T1", badArea), badArea);
    expect(/data-member="L2L3"[^>]*>(?:(?!data-member=).)*data-invalid-marker/.test(member)).toBe(true);
    expect(member.includes("Input error (!)")).toBe(true);
    const badRoller = withInputs(calcs, "T1", (i) => {
      (i.supports as { direction?: number[] }[])[1].direction = [0, 0];
    });
    const joint = renderCalcView(TrussView, demoCalc("T1", badRoller), badRoller);
    expect(joint.includes("L6 !")).toBe(true);
    expect(joint.includes("Supports (2)<span class=\"ml-1.5 text-xs text-compression\">✕ 1 problem</span>")).toBe(true);
  });

  it("read-only, renders the same tables without controls", () => {
    const readOnly = renderCalcView(TrussView, demoCalc("T1", calcs), calcs, { editable: false });
    expect(readOnly).not.toContain("<input");
    expect(readOnly).not.toContain("Import joints");
    expect(readOnly).toContain('data-testid="member-forces"');
    expect(readOnly).toContain("<td class=\"pp-num text-right\">4</td>");
  });
});

describe("LoadsPanel", () => {
  const draft = readTrussDraft({ ...(demoCalc("T1").inputs as object), loadCases: [{ id: "G", kind: "G", loads: [] }, { id: "Q", kind: "Q", loads: [{ joint: "L3", fy: -10 }] }] });
  const render = (fieldErrors: { path: string; message: string }[] = []) =>
    renderToStaticMarkup(createElement(LoadsPanel, { draft, columns: trussColumns(trussUnitText(draft.units)), fieldErrors, readOnly: false, onChange: () => undefined }));

  it("names each load input by its component, unit, load and case", () => {
    const html = render();
    expect(html).toContain('aria-label="fy (kN), load 1 in case Q"');
    expect(html).toContain('aria-label="w (kN/m), line load 2 in case Q"');
    expect(html).toContain('value="L0 L1 L2 L3 L4 L5 L6"');
  });

  it("puts a load's error on its field", () => {
    const html = render([{ path: "loadCases[1].loads[0].joint", message: 'Load 1 of case Q is on joint "L3x", which does not exist.' }]);
    expect(html).toMatch(/aria-label="Joint, load 1 in case Q" aria-invalid="true"/);
    expect(html).toContain("which does not exist.</span>");
  });
});

describe("GeneratorPanel", () => {
  it("asks for span, depth and panels in the truss's units and replaces the geometry only after a confirm", () => {
    const draft = readTrussDraft(demoCalc("T1").inputs);
    const html = renderToStaticMarkup(createElement(GeneratorPanel, { draft, readOnly: false, onGenerate: () => undefined }));
    expect(html).toContain('<option value="pratt" selected="">Pratt</option>');
    expect(html).toMatch(/Span<span[^>]*> \(m\)<\/span>/);
    expect(html).toContain(">Depth<");
    expect(html).toContain('value="24"');
    expect(html).toContain("Generate…");
    expect(html).not.toContain("Replace the geometry");
  });
});
