import { describe, expect, it } from "vitest";
import { demoFootbridgeTruss } from "@/lib/document/demo-footbridge-truss";
import type { PackageDocument } from "@/lib/document/document-types";
import { heading, paragraph } from "@/lib/document/prose-nodes";
import { buildReportModel } from "@/lib/report/build-report-model";
import { renderReportHtml } from "@/lib/report/html/render-report-html";
import { reportSource } from "../support/report-fixture";

/** The demo truss with its roller taken away: it can slide sideways, so it is unstable. */
function unstableDocument(): PackageDocument {
  const truss = demoFootbridgeTruss();
  truss.supports = truss.supports.filter((s) => s.type === "pin");
  return {
    type: "doc",
    content: [
      heading(1, "Analysis"),
      paragraph("A truss on one pin only."),
      { type: "truss", attrs: { id: "u-1", label: "T1", inputs: truss } },
      { type: "sectionCut", attrs: { id: "u-2", label: "S1", inputs: { truss: "T1", loadCase: "Q", members: ["U2U3", "U2L3", "L2L3"], keep: "L0" } } },
    ],
  };
}

describe("an unstable truss in the report", () => {
  const model = buildReportModel(reportSource(unstableDocument()));
  const calcs = model.narrative.flatMap((b) => (b.type === "calc" ? [b.calc] : []));

  it("prints its stability message in place of results, and the calc reading it waits", () => {
    const [t1, s1] = calcs;
    expect(t1.status).toBe("error");
    expect(t1.messages.join(" ")).toMatch(/unstable/i);
    expect(t1.results).toEqual([]);
    expect(s1.status).toBe("blocked");
    expect(s1.messages.join(" ")).toContain("T1");
  });

  it("never prints NaN or Infinity in the HTML", () => {
    // The stylesheets carry fonts as base64, where any three letters may occur; the content is what is read.
    const html = renderReportHtml(model).replace(/<style>[\s\S]*?<\/style>/g, "");
    expect(html).toMatch(/unstable/i);
    expect(html).not.toMatch(/NaN|Infinity/);
    expect(html).toContain("No results: this calc did not compute");
  });
});
