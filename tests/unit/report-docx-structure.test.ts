import { beforeAll, describe, expect, it } from "vitest";
import { renderReportDocx } from "@/lib/report/docx/render-docx";
import { docxFileNames, docxParts, fieldCodes, parseXml, textOf, W_NS } from "../support/docx-parts";
import { draftReportModel, issuedReportModel } from "../support/report-model-fixture";

const PRELIMINARY = "PRELIMINARY \u2014 NOT FOR CONSTRUCTION";

describe("DOCX package: parts, title block and tables", () => {
  const model = issuedReportModel();
  let parts: Record<string, string>;
  let files: string[];
  let document: Document;

  beforeAll(async () => {
    const buffer = await renderReportDocx(model);
    expect(Buffer.isBuffer(buffer)).toBe(true);
    parts = docxParts(buffer);
    files = docxFileNames(buffer);
    document = parseXml(parts["word/document.xml"]);
  });

  it("writes well-formed XML in every part", () => {
    for (const [path, xml] of Object.entries(parts)) expect(() => parseXml(xml), path).not.toThrow();
  });

  it("puts the title block in the header: firm, project, job, subject, by, checked, revision and Sheet PAGE of NUMPAGES", () => {
    const headers = Object.keys(parts).filter((p) => /^word\/header\d*\.xml$/.test(p));
    expect(headers.length).toBeGreaterThan(0);
    for (const path of headers) {
      const header = parseXml(parts[path]);
      const text = textOf(header);
      for (const expected of [model.meta.firmName, model.meta.projectName, model.meta.jobNumber, model.meta.packageTitle, "Ines Marlow 2026-11-28", "Tomas Reyne 2026-11-29", "Sheet", " of "]) expect(text).toContain(expected);
      expect(fieldCodes(header)).toEqual(expect.arrayContaining(["PAGE", "NUMPAGES"]));
    }
  });

  it("puts the fingerprint and the caution in every footer", () => {
    const footers = Object.keys(parts).filter((p) => /^word\/footer\d*\.xml$/.test(p));
    expect(footers.length).toBeGreaterThan(0);
    for (const path of footers) {
      const text = textOf(parseXml(parts[path]));
      expect(text).toContain(model.meta.fingerprint);
      expect(text).toContain(model.meta.safetyText);
      expect(text).not.toContain("PRELIMINARY");
    }
  });

  it("marks the header row of every table with a header cell to repeat across pages", () => {
    const body = document.getElementsByTagNameNS(W_NS, "body")[0];
    const tables = [...body.getElementsByTagNameNS(W_NS, "tbl")];
    const repeats = (row: Element) => [...row.getElementsByTagNameNS(W_NS, "tblHeader")].some((h) => !["false", "0", "off"].includes(h.getAttribute("w:val") ?? "true"));
    const withHeader = tables.filter((t) => [...t.getElementsByTagNameNS(W_NS, "tr")].some(repeats));
    // Inputs (4), results (3), document table, criteria (4), revision log, check record, response letter, appendix.
    expect(withHeader.length).toBe(16);
    for (const table of withHeader) {
      const rows = [...table.getElementsByTagNameNS(W_NS, "tr")];
      expect(repeats(rows[0])).toBe(true);
      expect(rows.slice(1).some(repeats)).toBe(false);
    }
    // The cover facts and the seal block have no header row to repeat.
    expect(tables.length - withHeader.length).toBe(2);
  });

  it("right-aligns the number columns", () => {
    const joints = [...document.getElementsByTagNameNS(W_NS, "tr")].find((r) => r.textContent?.startsWith("L2") && r.textContent.includes("6.000"));
    const justification = [...joints!.getElementsByTagNameNS(W_NS, "tc")].map((c) => c.getElementsByTagNameNS(W_NS, "jc")[0]?.getAttribute("w:val") ?? "left");
    expect(justification).toEqual(["left", "right", "right", "left"]);
  });

  it("uses Word's heading styles with the model's numbers, and bookmarks them for internal links", () => {
    const headings = [...document.getElementsByTagNameNS(W_NS, "p")].filter((p) => /^Heading\d$/.test(p.getElementsByTagNameNS(W_NS, "pStyle")[0]?.getAttribute("w:val") ?? ""));
    const texts = headings.map((h) => h.textContent);
    expect(texts).toEqual(expect.arrayContaining(["1  Scope", "1.1  Member schedule", "2  Section cut", "Design criteria", "Revision log", "Check record", "Response to plan-review comments", "Appendix A  Member forces, T1"]));
    const bookmarks = [...document.getElementsByTagNameNS(W_NS, "bookmarkStart")].map((b) => b.getAttribute("w:name"));
    expect(bookmarks).toContain("h_section_cut");
    // The index does not list itself.
    expect(texts).not.toContain("Index");
    const internal = [...document.getElementsByTagNameNS(W_NS, "hyperlink")].map((h) => h.getAttribute("w:anchor")).filter(Boolean);
    expect(internal).toContain("h_section_cut");
  });

  it("has an index field over the headings, the cover facts, the seal and the verification link", () => {
    expect(fieldCodes(document).some((code) => code.startsWith("TOC"))).toBe(true);
    const text = textOf(document);
    for (const expected of ["Alder Creek Parks Board", "Alder Creek trail crossing", "Rev 1", "PE-40213", "State of Oregon (fictional register)", "2027-12-31", "Signature and date", model.meta.verification!.url, model.meta.safetyText]) expect(text).toContain(expected);
    expect(text).not.toContain("PRELIMINARY");
    expect(parts["word/_rels/document.xml.rels"]).toContain(model.meta.verification!.url);
  });

  it("embeds the figure and seal PNGs and the calc diagram as SVG with a PNG fallback", () => {
    const media = files.filter((f) => f.startsWith("word/media/"));
    expect(media.filter((f) => f.endsWith(".svg"))).toHaveLength(1);
    expect(media.filter((f) => f.endsWith(".png")).length).toBeGreaterThanOrEqual(2);
    expect(parts["word/document.xml"]).toMatch(/svgBlip/);
  });

  it("makes the diagram a standalone SVG: namespace, size, and the app's font variables replaced", async () => {
    const { unzipSync, strFromU8 } = await import("fflate");
    const zip = unzipSync(new Uint8Array(await renderReportDocx(model)));
    const svgName = Object.keys(zip).find((f) => f.startsWith("word/media/") && f.endsWith(".svg"))!;
    const svg = parseXml(strFromU8(zip[svgName]));
    expect(svg.documentElement.namespaceURI).toBe("http://www.w3.org/2000/svg");
    expect([svg.documentElement.getAttribute("width"), svg.documentElement.getAttribute("height")]).toEqual(["240", "80"]);
    expect(strFromU8(zip[svgName])).not.toContain("var(--");
  });

  it("prints the response letter with where each comment is answered", () => {
    const text = textOf(document);
    expect(text).toContain("Show the top chord force by a section cut.");
    expect(text).toContain("S1; 2 Section cut");
  });

  it("sets the page size from the package (Letter here, A4 when asked)", async () => {
    const size = document.getElementsByTagNameNS(W_NS, "pgSz")[0];
    expect([size.getAttribute("w:w"), size.getAttribute("w:h")]).toEqual(["12240", "15840"]);
    const a4 = issuedReportModel();
    a4.meta.paperSize = "a4";
    const a4Doc = parseXml(docxParts(await renderReportDocx(a4))["word/document.xml"]);
    const a4Size = a4Doc.getElementsByTagNameNS(W_NS, "pgSz")[0];
    expect([a4Size.getAttribute("w:w"), a4Size.getAttribute("w:h")]).toEqual(["11906", "16838"]);
  });
});

describe("DOCX draft package", () => {
  it("says PRELIMINARY on the cover and in every footer, with no revision, seal or verification", async () => {
    const draft = draftReportModel();
    const parts = docxParts(await renderReportDocx(draft));
    const body = textOf(parseXml(parts["word/document.xml"]));
    expect(body).toContain(PRELIMINARY);
    expect(body).toContain("Draft (not issued)");
    expect(body).not.toContain("PE-40213");
    expect(body).not.toContain("verify/abc123");
    const footers = Object.keys(parts).filter((p) => /^word\/footer\d*\.xml$/.test(p));
    for (const path of footers) expect(textOf(parseXml(parts[path]))).toContain(PRELIMINARY);
    const headers = Object.keys(parts).filter((p) => /^word\/header\d*\.xml$/.test(p));
    for (const path of headers) expect(textOf(parseXml(parts[path]))).toContain("Draft");
  });
});
