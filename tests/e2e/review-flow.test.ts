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
});
