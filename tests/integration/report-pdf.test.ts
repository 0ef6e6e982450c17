import { execFileSync } from "node:child_process";
import { mkdirSync, mkdtempSync, rmSync, statSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { demoCalcIds, demoFootbridgeDocument } from "@/lib/document/demo-footbridge-document";
import { buildReportModel } from "@/lib/report/build-report-model";
import { closeBrowser } from "@/lib/report/pdf/browser";
import { renderReportPdf } from "@/lib/report/pdf/render-report-pdf";
import { indexEntries } from "@/lib/report/html/index-entries";
import type { ReportModel } from "@/lib/report/report-model";
import { reportSource } from "../support/report-fixture";

// Real Chromium (/usr/bin/chromium) and real Poppler: the PDF is read back the way a reviewer's tools read it.
const dir = mkdtempSync(join(tmpdir(), "pp-report-"));
const pages = (pdf: string) => Number(/Pages:\s+(\d+)/.exec(execFileSync("pdfinfo", [pdf], { encoding: "utf8" }))?.[1]);
const textOf = (pdf: string) => execFileSync("pdftotext", ["-layout", pdf, "-"], { encoding: "utf8" }).split("\f").filter((p, i, all) => i < all.length - 1 || p.trim());

describe("the footbridge package as a PDF", () => {
  let draft: { path: string; sheetCount: number; model: ReportModel };
  let issued: { path: string; sheetCount: number; model: ReportModel };

  beforeAll(async () => {
    const model = buildReportModel(reportSource(demoFootbridgeDocument()));
    const out = await renderReportPdf(model);
    writeFileSync(join(dir, "draft.pdf"), out.pdf);
    draft = { path: join(dir, "draft.pdf"), sheetCount: out.sheetCount, model };
    const issuedModel = buildReportModel(reportSource(demoFootbridgeDocument(), { issued: true, changedCalcIds: [demoCalcIds.S1] }));
    const second = await renderReportPdf(issuedModel);
    writeFileSync(join(dir, "issued.pdf"), second.pdf);
    issued = { path: join(dir, "issued.pdf"), sheetCount: second.sheetCount, model: issuedModel };
  }, 120000);

  afterAll(async () => {
    await closeBrowser();
    rmSync(dir, { recursive: true, force: true });
  });

  it("numbers each page Sheet x of N, once, with N the PDF's page count", () => {
    const n = pages(draft.path);
    expect(draft.sheetCount).toBe(n);
    expect(n).toBeGreaterThan(5);
    const text = textOf(draft.path);
    expect(text).toHaveLength(n);
    text.forEach((page, i) => {
      expect(page.match(/Sheet \d+ of \d+/g), `page ${i + 1}`).toEqual([`Sheet ${i + 1} of ${n}`]);
    });
  });

  it("prints in the index the sheet on which each part, heading and calc actually starts", () => {
    // The issued file: a draft's diagonal PRELIMINARY mark puts stray letters into the extracted lines.
    const text = textOf(issued.path);
    const indexPage = text.findIndex((p) => /^\s*Index\s*$/m.test(p));
    expect(indexPage).toBe(1);
    const lines = text[indexPage].split("\n");
    const entries = indexEntries(issued.model);
    for (const entry of entries) {
      const title = entry.title.replace(/\s+/g, " ");
      const line = lines.find((l) => l.replace(/\s+/g, " ").trim().startsWith(title.slice(0, 40)) && /\d\s*$/.test(l));
      expect(line, entry.title).toBeDefined();
      const printed = Number(/(\d+)\s*$/.exec(line as string)?.[1]);
      // Where the title really is: the first page after the index whose body (above the title block) shows it at a line start.
      // A calc starts at its bar ("S1 SECTION CUT"); the calculations part at its first heading, on the same sheet.
      const calc = issued.model.narrative.find((b) => b.type === "calc" && `calc-${b.calc.label}` === entry.anchor);
      const firstHeading = issued.model.narrative.find((b) => b.type === "heading");
      const needle =
        calc?.type === "calc" ? `${calc.calc.label} ${calc.calc.kindName.toUpperCase()}`
        : entry.anchor === "narrative" && firstHeading?.type === "heading" ? `${firstHeading.number} ${firstHeading.text}`
        : entry.title.replace(/\s+/g, " ");
      const actual = text.findIndex((p, i) => i > indexPage && p.split("\n").some((l) => l.replace(/\s+/g, " ").trim().startsWith(needle) && !l.includes("Sheet ")));
      expect(printed, entry.title).toBe(actual + 1);
    }
  });

  it("shows the full fingerprint on the cover", () => {
    const cover = textOf(draft.path)[0].replace(/\s+/g, " ");
    expect(cover).toContain(draft.model.meta.fingerprint);
    expect(cover).toContain(`${draft.sheetCount} sheets, each numbered`);
  });

  it("prints A4 sheets when the package asks for A4", async () => {
    const source = reportSource(demoFootbridgeDocument());
    source.meta = { ...source.meta, paperSize: "a4" };
    const out = await renderReportPdf(buildReportModel(source));
    const path = join(dir, "a4.pdf");
    writeFileSync(path, out.pdf);
    const info = execFileSync("pdfinfo", [path], { encoding: "utf8" });
    expect(info).toMatch(/Page size:\s+595\.\d* x 841\.\d*|Page size:\s+595 x 842/);
    expect(pages(path)).toBe(out.sheetCount);
    const text = textOf(path);
    expect(text[text.length - 1]).toContain(`Sheet ${out.sheetCount} of ${out.sheetCount}`);
  }, 60000);

  it("marks every sheet of a draft PRELIMINARY and no sheet of an issued revision", () => {
    textOf(draft.path).forEach((page, i) => expect(page, `page ${i + 1}`).toContain("PRELIMINARY"));
    textOf(issued.path).forEach((page, i) => expect(page, `page ${i + 1}`).not.toContain("PRELIMINARY"));
  });

  it("prints the caution in every footer", () => {
    textOf(draft.path).forEach((page, i) => expect(page.replace(/\s+/g, " "), `page ${i + 1}`).toContain("Results must be verified by a qualified engineer."));
  });

  it("carries the verification link on the cover of an issued revision", () => {
    expect(textOf(issued.path)[0].replace(/\s+/g, " ")).toContain("verify it at https://panelpoint.example/v/K7Q2M9");
  });

  it("embeds every font it uses", () => {
    const rows = execFileSync("pdffonts", [draft.path], { encoding: "utf8" }).trim().split("\n").slice(2);
    expect(rows.length).toBeGreaterThan(3);
    for (const row of rows) expect(row, row).toMatch(/\s(yes)\s+(yes|no)\s+(yes|no)\s+\d+\s+\d+\s*$/);
    const emb = rows.map((r) => r.trim().split(/\s+/).slice(-5)[0]);
    expect(emb.every((e) => e === "yes")).toBe(true);
    expect(rows.some((r) => r.includes("Inter"))).toBe(true);
    expect(rows.some((r) => r.includes("SourceSerif4"))).toBe(true);
    expect(rows.some((r) => r.includes("KaTeX_Main"))).toBe(true);
  });

  it("renders the cover and a calc sheet to pictures for review", () => {
    // pdftoppm pads the page number to the width of the page count.
    const pad = (n: number) => String(n).padStart(String(pages(issued.path)).length, "0");
    // .run/ is git-ignored and absent on a fresh clone.
    const out = join(process.cwd(), ".run", "tmp");
    mkdirSync(out, { recursive: true });
    execFileSync("pdftoppm", ["-png", "-r", "60", "-f", "1", "-l", "1", issued.path, join(out, "report-cover")]);
    const text = textOf(issued.path);
    const s1 = text.findIndex((p) => /^\s*S1\s+SECTION CUT/m.test(p));
    expect(s1).toBeGreaterThan(1);
    execFileSync("pdftoppm", ["-png", "-r", "60", "-f", String(s1 + 1), "-l", String(s1 + 1), issued.path, join(out, "report-calc")]);
    for (const picture of [`report-cover-${pad(1)}.png`, `report-calc-${pad(s1 + 1)}.png`]) expect(statSync(join(out, picture)).size).toBeGreaterThan(10_000);
    expect(issued.sheetCount).toBe(pages(issued.path));
  });
});
