import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { trussValueOf } from "@/components/editor/nodes/combinations/truss-choices";
import { DeflectionCheck } from "@/components/editor/nodes/deflection/deflection-check";
import { limitChoice, limitOptions } from "@/components/editor/nodes/deflection/limit-ratios";
import { readDeflectionInputs, withOptional } from "@/components/editor/nodes/deflection/read-deflection-inputs";
import { VirtualWorkTable } from "@/components/editor/nodes/deflection/virtual-work-table";
import { virtualWorkTable } from "@/components/editor/nodes/deflection/virtual-work-rows";
import type { DeflectionView as DeflectionViewData } from "@/lib/calcs/deflection/deflection-view";
import { evaluateCalcs } from "@/lib/calcs/evaluate-calcs";
import { demoCalcs, resultOf } from "./calcs-fixtures";

function evaluateDemo(change: Record<string, unknown> = {}) {
  const calcs = demoCalcs();
  const d = calcs.find((c) => c.label === "D1");
  if (!d) throw new Error("no D1");
  d.inputs = { ...(d.inputs as object), ...change };
  const evaluation = evaluateCalcs({ calcs });
  return { evaluation, view: resultOf(evaluation, "D1").view as DeflectionViewData };
}

describe("virtual work table", () => {
  const { evaluation, view } = evaluateDemo();
  const table = virtualWorkTable(view, trussValueOf(evaluation.results, "T1")?.model ?? null);

  it("shows each member's A and E in the units they were typed in the truss", () => {
    const l0l1 = table.rows.find((r) => r.member === "L0L1");
    expect(l0l1?.A).toBeCloseTo(1900, 6);
    expect(l0l1?.E).toBeCloseTo(210, 9);
    expect(table.units).toEqual({ force: "kN", length: "m", area: "mm²", modulus: "GPa", deflection: "mm" });
  });

  it("sums N·n·L/(A·E) to the deflection the calc reports", () => {
    expect(table.rows).toHaveLength(21);
    expect(table.sum).toBeCloseTo(view.value, 9);
    const u2u3 = table.rows.find((r) => r.member === "U2U3");
    // −150 kN × 2 × 4 m / (2865 mm² × 210 GPa) = −1.994 mm
    expect(u2u3?.contribution).toBeCloseTo(((-150 * 2 * 4) / (2865e-6 * 210e6)) * 1000, 3);
  });

  it("renders every member, then the sum in the deflection unit", () => {
    const html = renderToStaticMarkup(createElement(VirtualWorkTable, { table, symbol: "δy at L3" }));
    expect(html.match(/<tr>/g)?.length).toBe(22);
    expect(html).toContain("N·n·L/(A·E)");
    expect(html).toMatch(/Σ = δy at L3[\s\S]*−16\.29 mm/);
    expect(html).toContain(">1900<");
  });

  it("shows a dash where a member has no section", () => {
    const html = renderToStaticMarkup(createElement(VirtualWorkTable, { table: virtualWorkTable(view, null), symbol: "δ" }));
    expect(html).toContain(">—<");
  });
});

describe("DeflectionCheck", () => {
  it("gives the deflection with its sense, the allowable and PASS in words", () => {
    const html = renderToStaticMarkup(createElement(DeflectionCheck, { view: evaluateDemo().view }));
    expect(html).toMatch(/data-testid="deflection-value" data-value="-16\.29\d+" data-unit="mm">−16\.29\u2009mm</);
    expect(html).toContain("(downward)");
    expect(html).toContain("24 m / 360 = 66.67\u2009mm");
    expect(html).toMatch(/PASS <span aria-hidden="true">✓<\/span>/);
    expect(html).toContain("within the limit");
  });

  it("compares with the stiffness solution", () => {
    const html = renderToStaticMarkup(createElement(DeflectionCheck, { view: evaluateDemo().view }));
    expect(html).toContain('data-agrees="true"');
    expect(html).toContain("✓ agrees");
  });

  it("fails a limit the deflection exceeds, in words and shape", () => {
    const { view } = evaluateDemo({ limitRatio: 5000 });
    const html = renderToStaticMarkup(createElement(DeflectionCheck, { view }));
    expect(view.pass).toBe(false);
    expect(html).toMatch(/FAIL <span aria-hidden="true">✕<\/span>/);
    expect(html).toContain("exceeds the limit");
  });
});

describe("deflection inputs", () => {
  it("offers L/240, L/360, L/500 and custom", () => {
    expect(limitOptions.map((o) => o.label)).toEqual(["L/240", "L/360", "L/500", "Custom ratio"]);
    expect(limitChoice(500)).toBe("500");
    expect(limitChoice(300)).toBe("custom");
  });

  it("reads stored inputs leniently, keeping a blank ratio and span blank", () => {
    expect(readDeflectionInputs({ truss: "T1", joint: "L3", direction: "sideways" })).toEqual({ truss: "T1", loadCase: "", joint: "L3", direction: "y" });
    expect(readDeflectionInputs({ truss: "T1", joint: "L3", limitRatio: 500, span: 24 })).toMatchObject({ limitRatio: 500, span: 24 });
  });

  it("leaves a blank optional number out of the inputs", () => {
    const form = readDeflectionInputs({ truss: "T1", joint: "L3", span: 24 });
    expect(withOptional(form, "span", undefined)).not.toHaveProperty("span");
    expect(withOptional(form, "limitRatio", 240)).toMatchObject({ limitRatio: 240, span: 24 });
  });

  it("evaluates with the span entered instead of the truss's extent", () => {
    const { view } = evaluateDemo({ span: 12, limitRatio: 240 });
    expect(view.allowable).toBeCloseTo(50, 9);
  });
});
