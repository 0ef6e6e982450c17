import { beforeAll, describe, expect, it } from "vitest";
import { renderReportDocxWithStats } from "@/lib/report/docx/render-docx";
import { texToOmml } from "@/lib/report/docx/tex-to-omml";
import type { ReportModel } from "@/lib/report/report-model";
import { docxParts, M_NS, parseXml } from "../support/docx-parts";
import { equationsIn, issuedReportModel } from "../support/report-model-fixture";

describe("DOCX equations are native Word equations", () => {
  const model = issuedReportModel();
  let document: Document;
  let xml: string;
  let converted: number;

  beforeAll(async () => {
    const rendering = await renderReportDocxWithStats(model);
    xml = docxParts(rendering.buffer)["word/document.xml"];
    document = parseXml(xml);
    converted = rendering.equations.converted;
  });

  it("writes one m:oMath per equation in the model (steps, results, inline math)", () => {
    const expected = equationsIn(model).length;
    expect(expected).toBeGreaterThan(10);
    expect(document.getElementsByTagNameNS(M_NS, "oMath").length).toBe(expected);
    expect(converted).toBe(expected);
  });

  it("sets each calc step on its own line as an m:oMathPara", () => {
    const steps = model.narrative.flatMap((b) => (b.type === "calc" ? b.calc.steps : []));
    expect(document.getElementsByTagNameNS(M_NS, "oMathPara").length).toBe(steps.length);
  });

  it("declares the math namespace on the document root", () => {
    expect(document.documentElement.getAttribute("xmlns:m")).toBe(M_NS);
  });

  it("keeps the structure of the section-cut equation: subscripts as m:sSub, fractions as m:f", () => {
    const ommlOf = (tex: string) => {
      const result = texToOmml(tex);
      if (!result.ok) throw new Error(result.reason);
      return parseXml(result.omml);
    };
    const moment = ommlOf(String.raw`\sum M_{L2} = 0:\; F_{U2U3}\cdot h + R_A \cdot 2a = 0`);
    const subscripts = [...moment.getElementsByTagNameNS(M_NS, "sSub")].map((s) => s.getElementsByTagNameNS(M_NS, "sub")[0]?.textContent);
    expect(subscripts).toEqual(["L2", "U2U3", "A"]);
    const reaction = ommlOf(String.raw`R_A = \frac{P}{2} = 50\,\mathrm{kN}`);
    const fraction = reaction.getElementsByTagNameNS(M_NS, "f")[0];
    expect(fraction.getElementsByTagNameNS(M_NS, "num")[0].textContent).toBe("P");
    expect(fraction.getElementsByTagNameNS(M_NS, "den")[0].textContent).toBe("2");
    // The thin space between number and unit survives (the converter trims bare whitespace text).
    expect(reaction.documentElement.textContent).toMatch(/50\s+kN/);
  });

  it("prints an equation that cannot be converted as its TeX in the code font, and counts it", async () => {
    const broken: ReportModel = issuedReportModel();
    const bad = String.raw`F = \notacommand{x}`;
    broken.narrative.push({ type: "paragraph", runs: [{ type: "text", text: "Broken: " }, { type: "math", tex: bad }] });
    const rendering = await renderReportDocxWithStats(broken);
    const doc = parseXml(docxParts(rendering.buffer)["word/document.xml"]);
    expect(rendering.equations.failed.map((f) => f.tex)).toEqual([bad]);
    expect(doc.getElementsByTagNameNS(M_NS, "oMath").length).toBe(equationsIn(broken).length - 1);
    const runs = [...doc.getElementsByTagName("w:r")].filter((r) => r.textContent === bad);
    expect(runs).toHaveLength(1);
    expect(runs[0].getElementsByTagName("w:rStyle")[0]?.getAttribute("w:val")).toBe("CodeText");
    expect(doc.documentElement.textContent).toContain("1 equation is printed as TeX");
  });
});
