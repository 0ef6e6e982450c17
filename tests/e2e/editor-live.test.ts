import type { Page } from "puppeteer-core";
import { describe, expect, it } from "vitest";
import { db } from "@/db/knex";
import { BASE_URL } from "../support/api-client";
import { browserSuite } from "../support/browser-suite";
import { signInPage } from "../support/browser-session";
import { demoLogin } from "../support/demo-fixtures";

const suite = browserSuite();

const CUT = '[data-calc-label="S1"] [data-testid="cut-force"][data-member="U2U3"]';
const UTIL = '[data-calc-label="M1"] [data-testid="utilization"][data-member="U2U3"] [data-testid="utilization-value"]';
const FORMULA = '[data-calc-label="F1"] [data-testid="formula-line"][data-name="N_Ed"] [data-testid="formula-value"]';
const W_Q = '[data-calc-label="T1"] input[aria-label="w (kN/m), line load 2 in case Q"]';

async function valueOf(page: Page, selector: string): Promise<number> {
  await page.waitForSelector(selector);
  return Number(await page.$eval(selector, (el) => el.getAttribute("data-value")));
}

async function openLoads(page: Page) {
  const tab = await page.waitForSelector('[data-calc-label="T1"] ::-p-text(Loads)');
  await tab!.click();
  await page.waitForSelector(W_Q);
}

describe("live calcs in the footbridge package", () => {
  it("follows a load change in the truss into the section cut, the member utilization and the formula, without reloading, and keeps it after a reload", async () => {
    const before = await db().from("packages").select("version").where({ id: suite.ids.trussPackageId }).first();
    const page = await signInPage(suite.browser, demoLogin("engineer").email, demoLogin("engineer").password);
    await page.goto(`${BASE_URL}/projects/${suite.ids.footbridgeId}/packages/${suite.ids.trussPackageId}`, { waitUntil: "networkidle0" });

    const cut0 = await valueOf(page, CUT);
    const util0 = await valueOf(page, UTIL);
    const formula0 = await valueOf(page, FORMULA);
    expect(cut0).toBeCloseTo(-150, 6); // statics of the demo truss under Q = 6.25 kN/m: M/h at U2 = 450 kN·m / 3 m

    await openLoads(page);
    const input = (await page.$(W_Q))!;
    expect(Number(await input.evaluate((el) => (el as HTMLInputElement).value))).toBeCloseTo(6.25, 6);
    await input.click({ count: 3 });
    await input.type("8");
    await page.waitForFunction((sel, old) => Number(document.querySelector(sel)?.getAttribute("data-value")) !== old, { timeout: 10000 }, CUT, cut0);

    // The cut force is linear in the live load: −150 × 8 / 6.25.
    expect(await valueOf(page, CUT)).toBeCloseTo(-192, 6);
    expect(await valueOf(page, UTIL)).toBeGreaterThan(util0);
    expect(await valueOf(page, FORMULA)).toBeLessThan(formula0);

    await page.waitForFunction(() => /^\s*✓?\s*Saved/i.test(document.querySelector('[role="status"]')?.textContent ?? ""), { timeout: 20000 });
    const after = await db().from("packages").select("version").where({ id: suite.ids.trussPackageId }).first();
    expect(after.version).toBeGreaterThan(before.version);

    await page.reload({ waitUntil: "networkidle0" });
    expect(await valueOf(page, CUT)).toBeCloseTo(-192, 6);
    await openLoads(page);
    expect(Number(await page.$eval(W_Q, (el) => (el as HTMLInputElement).value))).toBeCloseTo(8, 6);
    await page.browserContext().close();
  });
});
