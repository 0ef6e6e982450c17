import { execFileSync, spawnSync } from "node:child_process";
import { existsSync, mkdirSync, mkdtempSync, readFileSync, realpathSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { dirname, join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { renderReportDocxWithStats, type DocxRendering } from "@/lib/report/docx/render-docx";
import { docxParts, fieldCodes, M_NS, parseXml, textOf } from "../support/docx-parts";
import { issuedReportModel } from "../support/report-model-fixture";

const which = spawnSync("sh", ["-c", "command -v soffice"], { encoding: "utf8" });
const soffice = which.status === 0 ? which.stdout.trim() : null;
// Writer imports OMML into its Math module (Debian: libreoffice-math, the
// library libsmlo.so); without it the equations are dropped on import, which
// says nothing about our file.
const hasMathModule = soffice !== null && existsSync(join(dirname(realpathSync(soffice)), "libsmlo.so"));

// A second reader's opinion of the file: LibreOffice opens the DOCX and writes
// it again. Runs where LibreOffice is installed (it is not part of the stack).
describe.skipIf(!soffice)("DOCX round trip through LibreOffice", () => {
  const dir = mkdtempSync(join(tmpdir(), "pp-docx-lo-"));
  const model = issuedReportModel();
  let rendering: DocxRendering;
  let resaved: Record<string, string>;

  beforeAll(async () => {
    rendering = await renderReportDocxWithStats(model);
    mkdirSync(join(dir, "in"));
    mkdirSync(join(dir, "out"));
    writeFileSync(join(dir, "in", "package.docx"), rendering.buffer);
    execFileSync(soffice!, [`-env:UserInstallation=file://${join(dir, "profile")}`, "--headless", "--convert-to", "docx:MS Word 2007 XML", "--outdir", join(dir, "out"), join(dir, "in", "package.docx")], { timeout: 120_000, stdio: "ignore" });
    resaved = docxParts(readFileSync(join(dir, "out", "package.docx")));
  }, 180_000);
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it("opens the file and keeps the headings, the title block fields, the fingerprint and the caution", () => {
    const body = textOf(parseXml(resaved["word/document.xml"]));
    expect(body).toContain("Scope");
    expect(body).toContain("Response to plan-review comments");
    const header = Object.keys(resaved).find((p) => /^word\/header\d*\.xml$/.test(p))!;
    expect(fieldCodes(parseXml(resaved[header])).join(" ")).toMatch(/PAGE[\s\S]*NUMPAGES|NUMPAGES[\s\S]*PAGE/);
    const footer = Object.keys(resaved).find((p) => /^word\/footer\d*\.xml$/.test(p))!;
    const footerText = textOf(parseXml(resaved[footer]));
    expect(footerText).toContain(model.meta.fingerprint);
    expect(footerText).toContain(model.meta.safetyText);
  });

  it.skipIf(!hasMathModule)("keeps every equation as m:oMath (needs LibreOffice's Math module)", () => {
    const again = parseXml(resaved["word/document.xml"]);
    expect(again.getElementsByTagNameNS(M_NS, "oMath").length).toBe(rendering.equations.converted);
  });
});
