import { describe, expect, it } from "vitest";
import { demoFootbridgeDocument } from "@/lib/document/demo-footbridge-document";
import type { PackageDocument } from "@/lib/document/document-types";
import { heading, paragraph } from "@/lib/document/prose-nodes";
import { buildReportModel } from "@/lib/report/build-report-model";
import { renderReportHtml } from "@/lib/report/html/render-report-html";
import { SAFETY_TEXT } from "@/lib/safety-notice";
import { reportSource } from "../support/report-fixture";

/** The HTML without its stylesheets (fonts as base64 would match anything). */
const content = (html: string) => html.replace(/<style>[\s\S]*?<\/style>/g, "");

describe("the report HTML", () => {
  const draft = content(renderReportHtml(buildReportModel(reportSource(demoFootbridgeDocument()))));

  it("has every part in sheet order", () => {
    const ids = ["cover", "index", "criteria", "revisions", "narrative", "calc-T1", "calc-D1", "check-record", "appendix-1", "appendix-2"];
    const at = ids.map((id) => draft.indexOf(`id="${id}"`));
    expect(at.every((i) => i > 0)).toBe(true);
    expect([...at].sort((a, b) => a - b)).toEqual(at);
  });

  it("prints the caution on the cover and in the sheet foot", () => {
    const escaped = SAFETY_TEXT.replace(/'/g, "&#39;");
    expect(draft.split(escaped).length - 1).toBeGreaterThanOrEqual(2);
  });

  it("marks a draft PRELIMINARY — NOT FOR CONSTRUCTION on the sheet template and the cover, with no verification link", () => {
    expect(draft).toContain('<div class="pp-watermark">PRELIMINARY — NOT FOR CONSTRUCTION</div>');
    expect(draft).toContain(">PRELIMINARY</span>");
    expect(draft).not.toContain("verify it at");
  });

  it("gives an issued revision the signature notice, the verification link and its QR code, and no PRELIMINARY mark", () => {
    const issued = content(renderReportHtml(buildReportModel(reportSource(demoFootbridgeDocument(), { issued: true }))));
    expect(issued).toContain("This file is digitally signed; verify it at https://panelpoint.example/v/K7Q2M9");
    expect(issued).toMatch(/<svg[^>]*aria-label="QR code of the verification link"/);
    expect(issued).not.toContain("PRELIMINARY");
    expect(issued).toContain("Rita Okafor, P.E.");
    expect(issued).toContain("PE-041122");
  });

  it("puts the full fingerprint on the cover and in the title block", () => {
    const { meta } = reportSource(demoFootbridgeDocument());
    expect(draft.split(meta.fingerprint).length - 1).toBeGreaterThanOrEqual(3);
  });

  it("escapes every text value, from the meta to the narrative", () => {
    const document: PackageDocument = { type: "doc", content: [heading(1, "<img src=x onerror=alert(1)>"), paragraph("5 < 6 & \"quoted\" <script>alert(2)</script>")] };
    const source = reportSource(document);
    source.meta = { ...source.meta, packageTitle: "<b>Trusses</b>", firmName: "K&V <Eng>" };
    const html = content(renderReportHtml(buildReportModel(source)));
    expect(html).not.toMatch(/<script>|<img src=x|<b>Trusses/);
    expect(html).toContain("&lt;img src=x onerror=alert(1)&gt;");
    expect(html).toContain("5 &lt; 6 &amp; &quot;quoted&quot; &lt;script&gt;alert(2)&lt;/script&gt;");
    expect(html).toContain("K&amp;V &lt;Eng&gt;");
  });

  it("typesets the working with KaTeX on the server", () => {
    expect(draft).toContain('class="katex"');
    expect(draft).not.toContain('class="pp-fail" title=');
  });
});
