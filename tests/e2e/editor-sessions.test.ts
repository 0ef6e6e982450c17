import type { Page } from "puppeteer-core";
import { describe, expect, it } from "vitest";
import { db } from "@/db/knex";
import { ApiClient, BASE_URL } from "../support/api-client";
import { browserSuite } from "../support/browser-suite";
import { signInPage, textOf } from "../support/browser-session";
import { demoLogin } from "../support/demo-fixtures";
import { seedPackage } from "../support/seed";

const suite = browserSuite();

const packageUrl = (id: string) => `${BASE_URL}/projects/${suite.ids.footbridgeId}/packages/${id}`;

async function openEditor(page: Page, id: string) {
  await page.goto(packageUrl(id), { waitUntil: "networkidle0" });
  await page.waitForSelector(".ProseMirror");
}

async function typeAtEnd(page: Page, text: string) {
  await page.click(".ProseMirror");
  await page.keyboard.down("Control");
  await page.keyboard.press("End");
  await page.keyboard.up("Control");
  await page.keyboard.press("Enter");
  await page.keyboard.type(text);
}

async function waitForSaved(page: Page) {
  await page.waitForFunction(() => /saved/i.test(document.querySelector('[role="status"]')?.textContent ?? "") && !/not saved/i.test(document.querySelector('[role="status"]')?.textContent ?? ""), { timeout: 20000 });
}

describe("two people editing one package", () => {
  it("gives the second save the conflict message and keeps the author's text on screen; nothing is lost on either side", async () => {
    const { id } = await seedPackage({ projectId: suite.ids.footbridgeId, title: "Conflict test" });
    const first = await signInPage(suite.browser, demoLogin("engineer").email, demoLogin("engineer").password);
    const second = await signInPage(suite.browser, demoLogin("projectEngineer").email, demoLogin("projectEngineer").password);
    await openEditor(first, id);
    await openEditor(second, id);

    await typeAtEnd(first, "The engineer's paragraph.");
    await waitForSaved(first);

    await typeAtEnd(second, "The project engineer's paragraph.");
    await second.waitForFunction(() => /newer version/i.test(document.body.innerText), { timeout: 20000 });
    expect(await textOf(second, ".ProseMirror")).toContain("The project engineer's paragraph.");

    const stored = await db().from("packages").select("document", "version").where({ id }).first();
    expect(JSON.stringify(stored.document)).toContain("The engineer's paragraph.");
    // The second author's text is kept on their device until they choose reload, keep mine or merge.
    const kept = await second.evaluate(() => Object.keys(localStorage).filter((k) => k.startsWith("panelpoint:draft:")).map((k) => localStorage.getItem(k) ?? "").join(""));
    expect(kept).toContain("The project engineer's paragraph.");
    await first.browserContext().close();
    await second.browserContext().close();
  });
});

describe("roles in the editor", () => {
  it("shows a checker the package read-only, with the same rendering and the caution", async () => {
    const page = await signInPage(suite.browser, demoLogin("checker").email, demoLogin("checker").password);
    await openEditor(page, suite.ids.trussPackageId);
    expect(await textOf(page, '[data-testid="read-only"]')).toMatch(/read-only/i);
    expect(await page.$eval(".ProseMirror", (el) => el.getAttribute("contenteditable"))).toBe("false");
    expect(await page.$$eval("[data-calc-label]", (els) => els.length)).toBeGreaterThanOrEqual(7);
    expect(await page.evaluate(() => document.body.innerText)).toContain("must be verified by a qualified engineer");
    await page.browserContext().close();
  });

  it("refuses a checker's save through the API", async () => {
    const checker = await ApiClient.signedIn(demoLogin("checker").email, demoLogin("checker").password);
    const res = await checker.request("PUT", `/api/v1/packages/${suite.ids.trussPackageId}/document`, { version: 1, document: { type: "doc", content: [] } });
    expect(res.status).toBe(403);
  });
});
