import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { beforeEach, describe, expect, it } from "vitest";
import { clearTexCache, renderTex, texCacheSize } from "@/components/math/render-tex";
import { Tex } from "@/components/math/tex";

describe("renderTex", () => {
  beforeEach(() => clearTexCache());

  it("typesets LaTeX to KaTeX HTML with MathML for screen readers", () => {
    const r = renderTex("\\sum F_y = 0");
    expect(r.ok).toBe(true);
    if (r.ok) {
      expect(r.html).toContain('class="katex"');
      expect(r.html).toContain("<math");
    }
  });

  it("returns the same result object for the same source, inline and display kept apart", () => {
    const a = renderTex("N_{U1} = 42.3\\,\\mathrm{kN}");
    expect(renderTex("N_{U1} = 42.3\\,\\mathrm{kN}")).toBe(a);
    const d = renderTex("N_{U1} = 42.3\\,\\mathrm{kN}", true);
    expect(d).not.toBe(a);
    expect(texCacheSize()).toBe(2);
    if (d.ok) expect(d.html).toContain("katex-display");
  });

  it("reports a parse error with KaTeX's message instead of throwing", () => {
    const r = renderTex("x^{");
    expect(r).toEqual({ ok: false, message: "Expected '}', got 'EOF' at end of input: x^{" });
  });

  it("reports an unknown command rather than drawing it in red", () => {
    const r = renderTex("\\notacommand{x}");
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toContain("\\notacommand");
  });

  it("does not let \\href inject a link", () => {
    const r = renderTex("\\href{javascript:alert(1)}{x}");
    const html = r.ok ? r.html : r.message;
    expect(html).not.toContain("<a ");
  });
});

describe("Tex", () => {
  it("renders inline math in a span and display math in a div", () => {
    expect(renderToStaticMarkup(createElement(Tex, { latex: "a+b" }))).toMatch(/^<span data-tex="">/);
    expect(renderToStaticMarkup(createElement(Tex, { latex: "a+b", display: true }))).toMatch(/^<div data-tex="">/);
  });

  it("shows a clear error box with the escaped source when the line does not parse", () => {
    const html = renderToStaticMarkup(createElement(Tex, { latex: "\\frac{<b>}{" }));
    expect(html).toContain("data-tex-error");
    expect(html).toContain("Cannot typeset this line:");
    expect(html).toContain("\\frac{&lt;b&gt;}{");
    expect(html).not.toContain("<b>");
  });
});
