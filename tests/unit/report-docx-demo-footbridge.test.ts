import { describe, expect, it } from "vitest";
import { buildReportModel } from "@/lib/report/build-report-model";
import { renderReportDocxWithStats } from "@/lib/report/docx/render-docx";
import type { ReportMeta } from "@/lib/report/report-model";
import { demoFootbridgeDocument } from "@/lib/document/demo-footbridge-document";
import { SAFETY_TEXT } from "@/lib/safety-notice";
import { docxParts, M_NS, parseXml } from "../support/docx-parts";
import { equationsIn } from "../support/report-model-fixture";

const meta: ReportMeta = {
  firmName: "Kestrel & Vane Engineering",
  projectName: "Alder Creek Footbridge",
  jobNumber: "KV-2026-014",
  client: null,
  site: null,
  paperSize: "a4",
  packageId: "pkg-demo",
  packageTitle: "Main trusses — 24 m Pratt span",
  revision: null,
  previousRevisionLabel: null,
  fingerprint: "0".repeat(64),
  preparedBy: { name: "Demo engineer", date: "2026-12-01" },
  checkedBy: null,
  seal: null,
  verification: null,
  generatedAt: "2026-12-02T12:00:00Z",
  safetyText: SAFETY_TEXT,
};

describe("DOCX of the demo footbridge package (built by buildReportModel)", () => {
  it("converts every step, result and inline equation of every calc to a native equation", async () => {
    const model = buildReportModel({ document: demoFootbridgeDocument(), meta, checkRecord: [], revisionLog: [], responseLetter: null, changedCalcIds: [] });
    const calcs = model.narrative.filter((b) => b.type === "calc");
    expect(calcs.length).toBeGreaterThanOrEqual(7);
    const expected = equationsIn(model).length;
    expect(expected).toBeGreaterThan(calcs.length);

    const rendering = await renderReportDocxWithStats(model);
    expect(rendering.equations.failed).toEqual([]);
    const document = parseXml(docxParts(rendering.buffer)["word/document.xml"]);
    expect(document.getElementsByTagNameNS(M_NS, "oMath").length).toBe(expected);
    expect(rendering.skippedImages).toEqual([]);
  });
});
