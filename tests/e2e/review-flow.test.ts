import { execFileSync, spawnSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { unzipSync, strFromU8 } from "fflate";
import type { Page } from "puppeteer-core";
import { describe, expect, it } from "vitest";
import { db } from "@/db/knex";
import { demoCalcIds } from "@/lib/document/demo-footbridge-document";
import { listCapturedMail } from "@/lib/mail/list-captured-mail";
import { BASE_URL } from "../support/api-client";
import { browserSuite } from "../support/browser-suite";
import { signInPage } from "../support/browser-session";
import { demoLogin } from "../support/demo-fixtures";

const suite = browserSuite();

const S1 = '[data-calc-label="S1"]';
const calcLabels = Object.keys(demoCalcIds);

async function openPackage(page: Page) {
  await page.goto(`${BASE_URL}/projects/${suite.ids.footbridgeId}/packages/${suite.ids.trussPackageId}`, { waitUntil: "networkidle0" });
  await page.waitForSelector('[data-testid="check-progress"]');
}

async function clickText(page: Page, scope: string, text: string) {
  const button = await page.waitForSelector(`${scope} ::-p-text(${text})`);
  await button!.click();
}

const statusOf = (page: Page) => page.$eval('[data-status]', (el) => el.getAttribute("data-status"));

async function waitForStatus(page: Page, status: string) {
  await page.waitForFunction((s) => document.querySelector("[data-status]")?.getAttribute("data-status") === s, { timeout: 20000 }, status);
}

async function waitForToast(page: Page, pattern: RegExp): Promise<string> {
  const handle = await page.waitForFunction(
    (source) => [...document.querySelectorAll("[data-sonner-toast]")].map((t) => t.textContent ?? "").find((t) => new RegExp(source).test(t)),
    { timeout: 20000 },
    pattern.source,
  );
  return (await handle.jsonValue()) as string;
}

async function waitForSaved(page: Page) {
  await page.waitForFunction(() => /^\s*✓?\s*Saved/i.test(document.querySelector('[role="status"]')?.textContent ?? ""), { timeout: 20000 });
}

async function mailTo(email: string, subject: RegExp, since: number) {
  for (let i = 0; i < 60; i++) {
    const found = (await listCapturedMail()).find((m) => m.to.includes(email) && subject.test(m.subject) && Date.parse(m.date) >= since - 2000);
    if (found) return found;
    await new Promise((r) => setTimeout(r, 500));
  }
  throw new Error(`no mail to ${email} matching ${subject}`);
}

describe("checking and issuing the footbridge package, in the browser with the demo accounts", () => {
  it("goes from draft through check, a remark on the section cut and its answer, to Rev 0 — and mails each step", { timeout: 240_000 }, async () => {
    const since = Date.now();
    const engineer = demoLogin("engineer");
    const checker = demoLogin("checker");
    const pe = demoLogin("projectEngineer");

    // The project engineer names the checker; the engineer submits.
    const pePage = await signInPage(suite.browser, pe.email, pe.password);
    await openPackage(pePage);
    await pePage.select('select[aria-label="Checker"]', (await db().from("users").select("id").where({ email: checker.email }).first()).id);
    await clickText(pePage, '[data-testid="review-panel"]', "Assign");
    await waitForToast(pePage, /Checker assigned/);

    const engPage = await signInPage(suite.browser, engineer.email, engineer.password);
    await openPackage(engPage);
    await clickText(engPage, '[data-testid="review-panel"]', "Submit for check");
    await waitForStatus(engPage, "in_check");

    // The checker raises a remark on the section cut and returns it.
    const chkPage = await signInPage(suite.browser, checker.email, checker.password);
    await openPackage(chkPage);
    expect(await statusOf(chkPage)).toBe("in_check");
    await clickText(chkPage, S1, "Remark on S1");
    await chkPage.waitForSelector('form[aria-label="New remark"]');
    expect(await chkPage.$eval('[data-testid="remark-target"]', (el) => el.textContent)).toContain("S1");
    await chkPage.type('textarea[aria-label="Remark"]', "Show the free body from the other side as well, so the sign of U2U3 is plain.");
    await clickText(chkPage, 'form[aria-label="New remark"]', "Raise remark");
    await chkPage.waitForSelector('[data-testid="remark"][data-remark-state="open"]');
    await (await chkPage.waitForSelector(`${S1} [aria-label="Return S1"]`))!.click();
    await chkPage.waitForSelector(`${S1} [data-testid="calc-check"][data-check-state="returned"]`);

    // Issuing now is refused with the reason.
    await pePage.reload({ waitUntil: "networkidle0" });
    await clickText(pePage, '[data-testid="review-panel"]', "Issue revision");
    expect(await waitForToast(pePage, /cannot be issued/)).toMatch(/not checked|open remark/);

    // The engineer answers and changes the cut (keeps the other side); the change clears the returned mark.
    await engPage.reload({ waitUntil: "networkidle0" });
    await engPage.waitForSelector('[data-testid="remark"][data-remark-state="open"]');
    // An engineer cannot close the checker's remark: the panel offers no Close.
    expect(await engPage.$('[data-testid="remark"] ::-p-text(Close remark)')).toBeNull();
    await engPage.type('[data-testid="remark"] textarea[aria-label="Reply"]', "Done: S1 now keeps the right-hand side; U2U3 is still −150 kN, in compression.");
    await clickText(engPage, '[data-testid="remark"]', "Reply");
    await engPage.waitForSelector('[data-testid="remark"][data-remark-state="answered"]', { timeout: 20000 }).catch(async () => {
      await clickText(engPage, '[role="tablist"]', "Answered");
      await engPage.waitForSelector('[data-testid="remark"][data-remark-state="answered"]');
    });
    await clickText(engPage, S1, "Keep the other side");
    await waitForSaved(engPage);
    await engPage.waitForSelector(`${S1} [data-testid="calc-check"][data-check-cleared="true"]`, { timeout: 20000 });

    // The checker closes the remark and checks every calc.
    await chkPage.reload({ waitUntil: "networkidle0" });
    await clickText(chkPage, '[role="tablist"]', "Answered");
    await clickText(chkPage, '[data-testid="remark"][data-remark-state="answered"]', "Close remark");
    await waitForToast(chkPage, /Remark closed/);
    for (const label of calcLabels) {
      await (await chkPage.waitForSelector(`[data-calc-label="${label}"] [aria-label="Mark ${label} checked"]`))!.click();
      await chkPage.waitForSelector(`[data-calc-label="${label}"] [data-testid="calc-check"][data-check-state="checked"]`, { timeout: 20000 });
    }
    await chkPage.waitForFunction(
      (n) => {
        const p = document.querySelector('[data-testid="check-progress"]');
        return p?.getAttribute("data-checked") === String(n) && p?.getAttribute("data-open-remarks") === "0";
      },
      { timeout: 20000 },
      calcLabels.length,
    );

    // The project engineer issues Rev 0.
    await pePage.reload({ waitUntil: "networkidle0" });
    expect(await statusOf(pePage)).toBe("checked");
    await clickText(pePage, '[data-testid="review-panel"]', "Issue revision");
    await waitForStatus(pePage, "issued");
    const revision = await db().from("revisions").where({ packageId: suite.ids.trussPackageId }).orderBy("number", "desc").first();
    expect(revision.number).toBe(0);
    expect(revision.label).toBe("0");
    expect(revision.checkRecord.calcs.every((c: { state: string }) => c.state === "checked")).toBe(true);

    // Each notification reached the person it is for.
    await mailTo(checker.email, /Submitted for check/, since);
    await mailTo(engineer.email, /New remark/, since);
    await mailTo(checker.email, /remark was answered/, since);
    await mailTo(engineer.email, /Checked:/, since);
    await mailTo(checker.email, /Issued: .*Rev 0/, since);

    // Work goes on in the next draft (other tests of this file set edit the same package).
    await clickText(pePage, '[data-testid="review-panel"]', "Start next revision");
    await waitForStatus(pePage, "draft");
    for (const p of [pePage, engPage, chkPage]) await p.browserContext().close();
  });

  it("exports the issued Rev 0 as a signed PDF and a DOCX that the project engineer downloads, and the verification page tells the file from an altered copy", { timeout: 240_000 }, async () => {
    const pe = demoLogin("projectEngineer");
    const revision = await db().from("revisions").where({ packageId: suite.ids.trussPackageId, number: 0 }).first();
    expect(revision, "the first test issues Rev 0").toBeDefined();
    const page = await signInPage(suite.browser, pe.email, pe.password);
    await openPackage(page);
    const target = `[data-testid="export-target"][data-revision="${revision.id}"]`;
    await (await page.waitForSelector(`${target} [data-testid="export-pdf"]`))!.click();
    await page.waitForFunction(() => document.querySelectorAll('[data-testid="export-row"]').length >= 1, { timeout: 20000 });
    await (await page.waitForSelector(`${target} [data-testid="export-docx"]`))!.click();
    // The worker renders both; the panel follows them to done (a failure would show its reason and fail here).
    await page.waitForFunction(
      () => {
        const rows = [...document.querySelectorAll('[data-testid="export-row"]')];
        const done = (f: string) => rows.some((r) => r.getAttribute("data-format") === f && r.getAttribute("data-status") === "done");
        return done("pdf") && done("docx");
      },
      { timeout: 180_000, polling: 1000 },
    );

    const dir = mkdtempSync(join(tmpdir(), "pp-export-"));
    const download = async (format: string) => {
      const href = await page.$eval(`[data-testid="export-row"][data-format="${format}"][data-status="done"] [data-testid="export-download"]`, (a) => (a as HTMLAnchorElement).href);
      const base64 = await page.evaluate(async (url) => {
        const res = await fetch(url);
        if (!res.ok) throw new Error(`download answered ${res.status}`);
        const bytes = new Uint8Array(await res.arrayBuffer());
        let bin = "";
        for (let i = 0; i < bytes.length; i += 0x8000) bin += String.fromCharCode(...bytes.subarray(i, i + 0x8000));
        return btoa(bin);
      }, href);
      return Buffer.from(base64, "base64");
    };

    // The PDF: every sheet numbered, the revision's fingerprint on the cover, a valid signature.
    const pdf = await download("pdf");
    const pdfPath = join(dir, "rev0.pdf");
    writeFileSync(pdfPath, pdf);
    const pageCount = Number(/Pages:\s+(\d+)/.exec(execFileSync("pdfinfo", [pdfPath], { encoding: "utf8" }))?.[1]);
    const sheets = execFileSync("pdftotext", ["-layout", pdfPath, "-"], { encoding: "utf8" }).split("\f").slice(0, pageCount);
    expect(pageCount).toBeGreaterThan(3);
    sheets.forEach((text, i) => expect(text.replace(/\s+/g, " ")).toContain(`Sheet ${i + 1} of ${pageCount}`));
    expect(sheets[0].replace(/\s+/g, "")).toContain(revision.fingerprint);
    expect(sheets[0]).toMatch(/digitally signed/i);
    expect(execFileSync("pdfsig", [pdfPath], { encoding: "utf8" })).toMatch(/Signature is Valid/);

    // One byte changed inside the signed range: pdfsig no longer validates it.
    const altered = Buffer.from(pdf);
    const at = altered.indexOf("Sheet 1 of");
    const spot = at > 0 ? at : Math.floor(altered.length / 3);
    altered[spot] = altered[spot] ^ 0x01;
    const alteredPath = join(dir, "rev0-altered.pdf");
    writeFileSync(alteredPath, altered);
    const sig = spawnSync("pdfsig", [alteredPath], { encoding: "utf8" });
    expect(`${sig.stdout}${sig.stderr}`).not.toMatch(/Signature is Valid/);

    // The public verification page, signed out: the issued facts, and a drop of each file.
    const exportRow = await db().from("exports").where({ revisionId: revision.id, format: "pdf", status: "done" }).first();
    const anonymous = await (await suite.browser.createBrowserContext()).newPage();
    await anonymous.goto(`${BASE_URL}/verify/${exportRow.verifyToken}`, { waitUntil: "networkidle0" });
    const shown = await anonymous.$eval('[data-testid="verification-page"]', (el) => el.textContent ?? "");
    expect(shown).toContain(revision.fingerprint);
    expect(shown).toContain(exportRow.sha256);
    const drop = async (path: string) => {
      const input = await anonymous.waitForSelector('[data-testid="verify-file-input"]');
      // Read the outcome shown before this drop first: the answer can arrive before uploadFile returns.
      const before = await anonymous.$eval("body", () => document.querySelector('[data-testid="verify-outcome"]')?.textContent ?? "");
      await (input as unknown as { uploadFile(p: string): Promise<void> }).uploadFile(path);
      const handle = await anonymous.waitForFunction(
        (prev) => {
          const el = document.querySelector('[data-testid="verify-outcome"]');
          return el && el.textContent !== prev ? el.getAttribute("data-identical") : null;
        },
        { timeout: 20000 },
        before,
      );
      return (await handle.jsonValue()) as string;
    };
    expect(await drop(pdfPath)).toBe("true");
    expect(await drop(alteredPath)).toBe("false");
    const wrong = await anonymous.goto(`${BASE_URL}/verify/NoSuchToken0000000000000`);
    expect(wrong?.status()).toBe(404);

    // The DOCX: every equation a native Word equation.
    const docx = await download("docx");
    const xml = strFromU8(unzipSync(new Uint8Array(docx))["word/document.xml"]);
    expect((xml.match(/<m:oMath[\s>]/g) ?? []).length).toBeGreaterThan(50);
    expect(xml).toContain("Rev 0");

    for (const p of [page, anonymous]) await p.browserContext().close();
  });
});
