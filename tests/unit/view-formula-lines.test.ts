import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { formulaErrorLines, isFormulaLinePath } from "@/components/editor/nodes/formula/formula-error-lines";
import { formulaLineItems, formulaSummary } from "@/components/editor/nodes/formula/formula-line-items";
import { FormulaLines } from "@/components/editor/nodes/formula/formula-lines";
import { readFormulaInputs } from "@/components/editor/nodes/formula/read-formula-inputs";
import { evaluateCalcs } from "@/lib/calcs/evaluate-calcs";
import type { FormulaView as FormulaViewData } from "@/lib/calcs/formula/formula-view";
import { demoCalcs, evaluateLast, resultOf, seedCalc } from "./calcs-fixtures";

const BROKEN = "# span check\na = 3 m\nb = a * \nd = a * 2 -> mm\ne = q + 1";

function evaluateSource(source: string) {
  const result = evaluateLast(seedCalc("formula", { source, preferredUnits: "SI" }));
  return { result, view: result.view as FormulaViewData | null };
}

describe("formula lines", () => {
  it("keeps every line in source order: notes, values and problems", () => {
    const { result, view } = evaluateSource(BROKEN);
    const items = formulaLineItems(BROKEN, view, result.fieldErrors);
    expect(items.map((i) => [i.line, i.kind])).toEqual([
      [1, "note"],
      [2, "value"],
      [3, "error"],
      [4, "value"],
      [5, "error"],
    ]);
    const d = items.find((i) => i.line === 4);
    expect(d).toMatchObject({ kind: "value", name: "d", display: "6000 mm", value: 6000, unit: "mm" });
  });

  it("shows a problem on its line with the source text and the message", () => {
    const { result, view } = evaluateSource(BROKEN);
    const e = formulaLineItems(BROKEN, view, result.fieldErrors).find((i) => i.line === 5);
    expect(e).toMatchObject({ kind: "error", name: "e", source: "e = q + 1" });
    expect(e?.kind === "error" && e.message).toContain("unknown name q");
  });

  it("still places a line's problem when the calc returned no view", () => {
    const items = formulaLineItems("x = 1\ny = 2 +", null, [{ path: "source:line2", message: "nothing to add" }]);
    expect(items).toEqual([{ kind: "error", line: 2, name: "y", source: "y = 2 +", message: "nothing to add" }]);
  });

  it("reads the line of each field error and only line paths count as lines", () => {
    const lines = formulaErrorLines([
      { path: "source:line3", message: "first" },
      { path: "source:line3", message: "second" },
      { path: "source", message: "too long" },
    ]);
    expect([...lines]).toEqual([[3, "first"]]);
    expect(isFormulaLinePath("source:line12")).toBe(true);
    expect(isFormulaLinePath("preferredUnits")).toBe(false);
  });

  it("sums up in words, naming the lines with problems", () => {
    const { result, view } = evaluateSource(BROKEN);
    expect(formulaSummary(formulaLineItems(BROKEN, view, result.fieldErrors))).toBe("2 values; lines 3 and 5 have problems");
    expect(formulaSummary([{ kind: "value", line: 1, name: "a", latex: "a", display: "1" }])).toBe("1 value");
  });

  it("reads odd stored inputs as an empty SI formula rather than failing", () => {
    expect(readFormulaInputs(null)).toEqual({ source: "", preferredUnits: "SI" });
    expect(readFormulaInputs({ source: 5, preferredUnits: "US" })).toEqual({ source: "", preferredUnits: "US" });
  });
});

describe("FormulaLines", () => {
  const render = (source: string, collapsed = false) => {
    const { result, view } = evaluateSource(source);
    return renderToStaticMarkup(createElement(FormulaLines, { items: formulaLineItems(source, view, result.fieldErrors), collapsed }));
  };

  it("marks each line with its name and its result for tests and scripts", () => {
    const html = render(BROKEN);
    expect(html.match(/data-testid="formula-line"/g)?.length).toBe(4);
    expect(html).toContain('data-name="d"');
    expect(html).toMatch(/data-testid="formula-value" data-value="6000" data-unit="mm">6000 mm</);
  });

  it("typesets the working and says what is wrong on the broken lines without hiding the others", () => {
    const html = render(BROKEN);
    expect(html).toContain("katex");
    expect(html).toMatch(/data-name="b" data-error="true"/);
    expect(html).toContain("Line 3: cannot read the expression");
    expect(html).toMatch(/aria-label="line 3"><span aria-hidden="true">✕ <\/span>3/);
    expect(html).toContain("span check");
  });

  it("collapsed, shows name and result only", () => {
    const html = render("a = 3 m\nb = a * 2", true);
    expect(html).not.toContain("katex");
    expect(html).toMatch(/<code[^>]*>b<\/code>/);
    expect(html).toContain(">6 m<");
  });

  it("shows the demo formula's values read from the other calcs", () => {
    const calcs = demoCalcs();
    const f1 = resultOf(evaluateCalcs({ calcs }), "F1");
    const source = readFormulaInputs(calcs.find((c) => c.label === "F1")?.inputs).source;
    const html = renderToStaticMarkup(createElement(FormulaLines, { items: formulaLineItems(source, f1.view as FormulaViewData, f1.fieldErrors) }));
    expect(html).toMatch(/data-name="sigma_Ed"[\s\S]*data-testid="formula-value" data-value="-112\.\d+" data-unit="MPa">−112\.5 MPa</);
  });
});
