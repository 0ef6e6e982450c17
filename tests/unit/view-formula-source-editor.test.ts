import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { FormulaSourceEditor, type FormulaSourceEditorProps } from "@/components/editor/nodes/formula/formula-source-editor";

const render = (props: Partial<FormulaSourceEditorProps> = {}) =>
  renderToStaticMarkup(createElement(FormulaSourceEditor, { source: "a = 3 m\nb = a *\nc = 2", onChange: () => undefined, readOnly: false, errorLines: new Map(), ...props }));

describe("FormulaSourceEditor", () => {
  it("numbers every line and grows with the text so numbers stay level with lines", () => {
    const html = render({ source: "a = 1\nb = 2\nc = 3\nd = 4" });
    expect(html).toMatch(/rows="4"/);
    expect(html).toMatch(/wrap="off"/);
    expect(html.match(/<li /g)?.length).toBe(4);
  });

  it("marks the number of a line with a problem by a cross and colour, and says the field is invalid", () => {
    const html = render({ errorLines: new Map([[2, "nothing after *"]]), describedBy: "lines" });
    expect(html).toMatch(/text-compression" title="nothing after \*">✕\u20092<\/li>/);
    expect(html).toContain('aria-invalid="true"');
    expect(html).toMatch(/aria-describedby="[^"]*lines"/);
  });

  it("explains the syntax: units, references, notes and result units", () => {
    const html = render();
    expect(html).toContain("name = expression");
    expect(html).toContain("T1.F_U2U3_G");
    expect(html).toContain("# ");
    expect(html).toContain("-&gt; MPa");
  });

  it("read-only, shows the same lines without the hint and refuses typing", () => {
    const html = render({ readOnly: true });
    expect(html).toContain("readOnly");
    expect(html).not.toContain("name = expression");
    expect(html).toContain("a = 3 m");
  });
});
