import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { CaseKindsTable } from "@/components/editor/nodes/combinations/case-kinds-table";
import { CombinationListTable } from "@/components/editor/nodes/combinations/combination-list-table";
import { combinationsSummary } from "@/components/editor/nodes/combinations/combinations-summary";
import { formatFigure, formatQuantity } from "@/components/editor/nodes/combinations/format-figure";
import { GoverningTable } from "@/components/editor/nodes/combinations/governing-table";
import { loadCaseOptions, trussChoices, trussOptions, trussValueOf } from "@/components/editor/nodes/combinations/truss-choices";
import type { CombinationsView as CombinationsViewData } from "@/lib/calcs/combinations/combinations-view";
import { evaluateCalcs } from "@/lib/calcs/evaluate-calcs";
import { demoCalcs, resultOf } from "./calcs-fixtures";

const evaluation = evaluateCalcs({ calcs: demoCalcs() });
const view = resultOf(evaluation, "C1").view as CombinationsViewData;

describe("GoverningTable", () => {
  const html = renderToStaticMarkup(createElement(GoverningTable, { members: view.members, force: "kN" }));

  it("has one row per member, marked with the member", () => {
    expect(html.match(/data-testid="governing"/g)?.length).toBe(view.members.length);
    expect(html).toContain('data-member="U2U3"');
  });

  it("gives the max and min with their combinations and tension or compression in words", () => {
    const row = html.slice(html.indexOf('data-member="U2U3"'), html.indexOf("</tr>", html.indexOf('data-member="U2U3"')));
    expect(row).toContain("−322.2");
    expect(row).toContain("(6.10) 1.35G + 1.5Q");
    expect(row).toContain("(compression)");
    expect(html).toContain("(tension)");
  });
});

describe("the other Combinations tables", () => {
  it("lists every combination with its factors and its edition and equation", () => {
    const html = renderToStaticMarkup(createElement(CombinationListTable, { combinations: view.combinations, caseIds: ["G", "Q"] }));
    expect(html).toContain("(6.10) 1.35G + 1.5Q");
    expect(html).toContain("EN 1990:2002 Eq. 6.10 with Table A1.2(B), Q leading");
    expect(html).toMatch(/>1\.35<\/td>/);
  });

  it("shows each case's kind and flags a kind the set does not combine", () => {
    const html = renderToStaticMarkup(
      createElement(CaseKindsTable, { trussLabel: "T1", cases: [{ id: "G", kind: "G" }, { id: "Snow", kind: "S" }], combined: ["D", "L", "Lr", "S", "R", "W"], setName: "ASCE/SEI 7-16", readOnly: true }),
    );
    expect(html).toContain("✓ yes");
    expect(html).toContain("✕ not a kind ASCE/SEI 7-16 combines");
  });

  it("offers ψ0 for variable cases under EN 1990, blank meaning Table A1.1", () => {
    const html = renderToStaticMarkup(
      createElement(CaseKindsTable, { trussLabel: "T1", cases: view.cases, combined: ["G", "Q", "S", "W"], setName: "EN 1990", psi0: {}, onPsi0: () => undefined, readOnly: false }),
    );
    expect(html).toContain('aria-label="ψ0 of load case Q"');
    expect(html).toContain("blank: 0.7");
    expect(html).toContain("permanent: no ψ₀");
  });

  it("sums up with the largest member force, its member and combination", () => {
    expect(combinationsSummary(view, "EN 1990 Eq. 6.10")).toBe("2 combinations (EN 1990 Eq. 6.10); largest member force U2U3 −322.2\u2009kN (compression) by (6.10) 1.35G + 1.5Q");
  });
});

describe("picking a truss and a case", () => {
  it("lists the package's trusses, and its Combinations calcs when asked", () => {
    expect(trussChoices(evaluation.results).map((c) => c.label)).toEqual(["T1"]);
    const both = trussChoices(evaluation.results, ["truss", "combinations"]);
    expect(both.map((c) => [c.label, c.kind])).toEqual([["T1", "truss"], ["C1", "combinations"]]);
    expect(trussOptions(both, "T1")[1].label).toBe("C1: T1 with its combinations");
  });

  it("keeps a reference to a missing truss selectable, marked", () => {
    expect(trussOptions(trussChoices(evaluation.results), "T7")[0]).toEqual({ value: "T7", label: "T7 (no such truss calc)" });
  });

  it("offers the first case, each case, and a Combinations calc's combinations", () => {
    const t1 = trussValueOf(evaluation.results, "T1");
    expect(loadCaseOptions(t1, "").map((o) => o.value)).toEqual(["", "G", "Q"]);
    expect(loadCaseOptions(t1, "")[0].label).toBe("First load case (G)");
    const c1 = loadCaseOptions(trussValueOf(evaluation.results, "C1"), "W");
    expect(c1.some((o) => o.label === "Combination (6.10) 1.35G + 1.5Q")).toBe(true);
    expect(c1[c1.length - 1]).toEqual({ value: "W", label: "W (not in this truss)" });
  });
});

describe("formatFigure", () => {
  it("rounds to significant figures with a true minus, never losing integer digits", () => {
    expect(formatFigure(-322.1999999)).toBe("−322.2");
    expect(formatFigure(12345.6)).toBe("12346");
    expect(formatFigure(1e-13)).toBe("0");
    expect(formatFigure(2.1e8)).toBe("2.1×10⁸");
    expect(formatQuantity(2865, "mm^2")).toBe("2865\u2009mm²");
  });
});
