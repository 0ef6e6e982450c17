import { describe, expect, it } from "vitest";
import { demoFootbridgeDocument } from "@/lib/document/demo-footbridge-document";
import { documentSchema } from "@/lib/document/document-schema";
import { validatePackageDocument } from "@/lib/document/validate-package-document";

type Json = Record<string, unknown>;
const doc = (...content: unknown[]) => ({ type: "doc", content });
const p = (...content: unknown[]) => ({ type: "paragraph", content });
const t = (text: string, marks?: unknown[]) => (marks ? { type: "text", text, marks } : { type: "text", text });

/** The refusal validatePackageDocument gives, failing the test if the document was accepted. */
function refusal(value: unknown): { message: string; path?: string } {
  const r = validatePackageDocument(value);
  if (r.ok) throw new Error("expected the document to be refused");
  return r;
}

describe("documentSchema", () => {
  it("accepts the demo package and the narrative nodes the editor writes", () => {
    expect(documentSchema.safeParse(demoFootbridgeDocument()).success).toBe(true);
    const narrative = doc(
      { type: "heading", attrs: { level: 2 }, content: [t("Loads")] },
      p(t("See "), t("the site", [{ type: "link", attrs: { href: "https://example.org/a?b=1", target: "_blank", rel: "noopener noreferrer nofollow", class: null } }]), { type: "hardBreak" }, t("A", [{ type: "bold" }, { type: "subscript" }])),
      { type: "orderedList", attrs: { start: 1, type: null }, content: [{ type: "listItem", content: [p(t("one"))] }] },
      { type: "blockquote", content: [p(t("quote"))] },
      { type: "horizontalRule" },
      { type: "pageBreak" },
      { type: "figure", attrs: { src: "firms/kv/packages/p1/elevation.png", caption: "Elevation", alt: "Truss elevation" } },
      { type: "figure", attrs: { src: "/api/v1/files/3f2a/content", caption: "", alt: "" } },
      { type: "figure", attrs: { src: null, caption: "", alt: "" } },
      p({ type: "standardReference", attrs: { code: "EN 1990", edition: "2002", clause: "" } }, t("mail", [{ type: "link", attrs: { href: "mailto:checker@example.org" } }])),
      p(),
    );
    expect(documentSchema.safeParse(narrative).success).toBe(true);
  });

  it("refuses an unknown node type on its type, naming it", () => {
    const r = refusal(doc(p(t("a")), p(t("b")), p(t("c")), { type: "colourBox", content: [] }));
    expect(r.path).toBe("content[3].type");
    expect(r.message).toContain('"colourBox" is not a node');
  });

  it("refuses an unknown attribute on its own path", () => {
    const r = refusal(doc(p(t("a")), p(t("b")), { type: "heading", attrs: { level: 1, colour: "red" }, content: [t("c")] }));
    expect(r.path).toBe("content[2].attrs.colour");
    expect(r.message).toContain('a heading node has no attribute "colour"');
  });

  it("refuses a javascript: link, a data: link and a link without a scheme", () => {
    for (const href of ["javascript:alert(1)", "JAVASCRIPT:alert(1)", "data:text/html,<b>x</b>", "example.org"]) {
      const r = refusal(doc(p(t("x", [{ type: "link", attrs: { href } }]))));
      expect(r.path).toBe("content[0].content[0].marks[0].attrs.href");
    }
  });

  it("refuses a figure whose source is a script, another site or a path out of the store", () => {
    for (const src of ["javascript:alert(1)", "https://evil.example/x.png", "//evil.example/x.png", "../secrets", "data:image/png;base64,AAAA"]) {
      expect(refusal(doc({ type: "figure", attrs: { src, caption: "", alt: "" } })).path).toBe("content[0].attrs.src");
    }
  });

  it("refuses marks it does not know", () => {
    const r = refusal(doc(p(t("x", [{ type: "underline" }]))));
    expect(r.path).toBe("content[0].content[0].marks[0].type");
  });

  it("refuses a node where it may not stand", () => {
    expect(refusal(doc(t("loose text"))).path).toBe("content[0].type");
    expect(refusal(doc({ type: "bulletList", content: [p(t("x"))] })).path).toBe("content[0].content[0].type");
  });

  it("refuses a heading level beyond 4", () => {
    expect(refusal(doc({ type: "heading", attrs: { level: 5 }, content: [t("x")] })).path).toBe("content[0].attrs.level");
  });

  it("refuses a text node over 100,000 characters", () => {
    expect(refusal(doc(p(t("x".repeat(100_001))))).path).toBe("content[0].content[0].text");
    expect(validatePackageDocument(doc(p(t("x".repeat(100_000))))).ok).toBe(true);
  });

  it("refuses nodes nested more than 20 deep", () => {
    let node: Json = p(t("deep"));
    for (let i = 0; i < 19; i++) node = { type: "blockquote", content: [node] };
    const r = refusal(doc(node));
    expect(r.message).toContain("more than 20 levels");
    let fits: Json = p(t("deep"));
    for (let i = 0; i < 17; i++) fits = { type: "blockquote", content: [fits] };
    expect(validatePackageDocument(doc(fits)).ok).toBe(true);
  });

  it("refuses a 5 MB paste of garbage before looking at its nodes, with a clear message", () => {
    const garbage = "%$#@!".repeat(1024 * 1024);
    for (const value of [garbage, doc(p(t(garbage))), { junk: Array.from({ length: 400_000 }, (_, i) => ({ i, s: "abcdefgh" })) }]) {
      // Counting stops at the limit (the message says "more than"), so a huge paste costs no more than 2 MB of walking.
      const r = refusal(value);
      expect(r.message).toMatch(/MB; a package document may be at most 2 MB/);
    }
  });

  it("refuses two calcs with the same label or the same id, on the second", () => {
    const demo = demoFootbridgeDocument();
    const content = demo.content ?? [];
    const c1 = content.findIndex((n) => n.type === "combinations");
    const s1 = content.findIndex((n) => n.type === "sectionCut");
    const sameLabel = structuredClone(demo);
    (sameLabel.content?.[s1] as { attrs: Json }).attrs.label = "C1";
    expect(refusal(sameLabel)).toMatchObject({ path: `content[${s1}].attrs.label`, message: expect.stringContaining("label C1 is already used") });
    const sameId = structuredClone(demo);
    (sameId.content?.[s1] as { attrs: Json }).attrs.id = (content[c1] as { attrs: Json }).attrs.id;
    expect(refusal(sameId).path).toBe(`content[${s1}].attrs.id`);
  });

  it("refuses calc inputs of the wrong shape, naming the calc and the field", () => {
    const demo = demoFootbridgeDocument();
    const at = (demo.content ?? []).findIndex((n) => n.type === "truss");
    const truss = demo.content?.[at] as { attrs: { inputs: { members: Json[] } } };
    truss.attrs.inputs.members[2].A = "big";
    const r = refusal(demo);
    expect(r.path).toBe(`content[${at}].attrs.inputs.members[2].A`);
    expect(r.message).toBe("Calc T1 (Truss) has invalid inputs at members[2].A: must be a finite number.");
  });

  it("refuses a calc label that could not be referenced", () => {
    const demo = demoFootbridgeDocument();
    const at = (demo.content ?? []).findIndex((n) => n.type === "formula");
    (demo.content?.[at] as { attrs: Json }).attrs.label = "F.1";
    expect(refusal(demo).path).toBe(`content[${at}].attrs.label`);
  });
});
