import { describe, expect, it } from "vitest";
import { evaluateCalcs } from "@/lib/calcs/evaluate-calcs";
import { extractCalcs } from "@/lib/calcs/extract-calcs";
import { demoCalcIds, demoFootbridgeDocument } from "@/lib/document/demo-footbridge-document";
import type { PackageDocument } from "@/lib/document/document-types";
import { buildReportModel } from "@/lib/report/build-report-model";
import type { ReportCalc } from "@/lib/report/report-model";
import { reportSource } from "../support/report-fixture";

const calcsOf = (blocks: ReturnType<typeof buildReportModel>["narrative"]): ReportCalc[] => blocks.flatMap((b) => (b.type === "calc" ? [b.calc] : []));

describe("the report model of the demo footbridge package", () => {
  const model = buildReportModel(reportSource(demoFootbridgeDocument()));
  const calcs = calcsOf(model.narrative);

  it("holds every calc of the document, in order, computed, with steps and results", () => {
    expect(calcs.map((c) => c.label)).toEqual(["T1", "C1", "S1", "J1", "F1", "M1", "D1"]);
    for (const c of calcs) {
      expect(c.status, c.label).toBe("ok");
      expect(c.steps.length, c.label).toBeGreaterThan(0);
      expect(c.results.length, c.label).toBeGreaterThan(0);
      expect(c.inputs.length, c.label).toBeGreaterThan(0);
      expect(c.messages, c.label).toEqual([]);
    }
  });

  it("draws the truss diagrams of the calcs whose editor views draw one", () => {
    const drawn = calcs.filter((c) => c.diagramSvg).map((c) => c.label);
    expect(drawn).toEqual(["T1", "S1", "J1", "D1"]);
    expect(calcs.find((c) => c.label === "T1")?.diagramSvg).toMatch(/^<figure[^>]*><svg/);
  });

  it("numbers the headings as the editor does", () => {
    const headings = model.narrative.flatMap((b) => (b.type === "heading" ? [`${b.number} ${b.text}`] : []));
    expect(headings).toEqual(["1 Design criteria", "2 Loads", "3 Analysis", "4 Member checks", "5 Deflection", "6 Conclusions"]);
  });

  it("prints standard references as text in the paragraphs", () => {
    const text = JSON.stringify(model.narrative);
    expect(text).toContain("EN 1993-1-1:2005 §6.2.3, 6.3.1");
    expect(text).toContain("EN 1990:2002 Eq. 6.10");
  });

  it("draws the design criteria from the text and the calcs", () => {
    const codes = model.criteria.codes.map((c) => `${c.code}:${c.edition}`);
    expect(codes).toEqual(expect.arrayContaining(["EN 1990:2002", "EN 1991-2:2003", "EN 1993-1-1:2005"]));
    expect(model.criteria.materials.find((m) => m.usedBy.includes("M1"))?.properties).toContain("fy = 355 MPa");
    const q = model.criteria.loadCases.find((l) => l.id === "Q");
    const g = model.criteria.loadCases.find((l) => l.id === "G");
    expect(q?.usedBy).toEqual(expect.arrayContaining(["T1", "C1", "S1", "J1", "D1"]));
    // S1, J1 and D1 read case Q only.
    expect(g?.usedBy).not.toContain("S1");
    expect(model.criteria.combinations.map((c) => c.expression)).toContain("1.35·G + 1.5·Q");
  });

  it("gives full member-force tables per case and per combination in the appendices", () => {
    expect(model.appendices.map((a) => a.calcLabel)).toEqual(["T1", "C1"]);
    const t1 = model.appendices[0];
    const forces = t1.tables.find((t) => t.caption?.includes("Q: member forces"));
    expect(forces?.rows).toHaveLength(21);
  });

  it("recomputes a draft from its document rather than trusting stored results", () => {
    const document = demoFootbridgeDocument();
    const stale = evaluateCalcs({ calcs: extractCalcs(document) }).results;
    // Doubling the pedestrian line load must double the Q reactions printed.
    const heavier = JSON.parse(JSON.stringify(document).replace('"w":6.25', '"w":12.5')) as PackageDocument;
    const draft = buildReportModel(reportSource(heavier));
    const reaction = (m: ReturnType<typeof buildReportModel>) => calcsOf(m.narrative).find((c) => c.label === "T1")?.results.find((r) => r.name === "R_L0_Q_y")?.value;
    expect(reaction(draft)).toBe("150");
    // An issued revision passes its frozen results, and those are what is printed.
    const issued = buildReportModel({ ...reportSource(heavier, { issued: true }), results: stale });
    expect(reaction(issued)).toBe("75");
  });

  it("marks the calcs changed since the previous revision", () => {
    const revised = buildReportModel(reportSource(demoFootbridgeDocument(), { issued: true, changedCalcIds: [demoCalcIds.S1] }));
    expect(calcsOf(revised.narrative).filter((c) => c.revised).map((c) => c.label)).toEqual(["S1"]);
  });
});
