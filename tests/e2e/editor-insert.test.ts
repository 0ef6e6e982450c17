import { describe, expect, it } from "vitest";
import { db } from "@/db/knex";
import { BASE_URL } from "../support/api-client";
import { browserSuite } from "../support/browser-suite";
import { signInPage } from "../support/browser-session";
import { demoLogin } from "../support/demo-fixtures";
import { seedPackage } from "../support/seed";

const suite = browserSuite();

describe("inserting calcs", () => {
  it("inserts a calc by typing its command at the start of a line and another from the menu, each with the next free label, and saves them", async () => {
    const ids = suite.ids;
    const { id } = await seedPackage({ projectId: suite.ids.footbridgeId, title: "Insert test" });
    const page = await signInPage(suite.browser, demoLogin("engineer").email, demoLogin("engineer").password);
    await page.goto(`${BASE_URL}/projects/${suite.ids.footbridgeId}/packages/${id}`, { waitUntil: "networkidle0" });
    await page.click(".ProseMirror");
    await page.keyboard.type("Loads are derived below.");
    await page.keyboard.press("Enter");
    await page.keyboard.type("/formula ");
    await page.waitForSelector('[data-calc-label="F1"]');

    await page.select('select[aria-label="Insert calc"]', "truss");
    await page.waitForSelector('[data-calc-label="T1"]');
    await page.select('select[aria-label="Insert calc"]', "formula");
    await page.waitForSelector('[data-calc-label="F2"]');
    expect(await page.$eval('[data-calc-label="F1"]', (el) => el.getAttribute("data-calc-status"))).toBe("ok");

    await page.waitForFunction(() => /^\s*✓?\s*Saved/i.test(document.querySelector('[role="status"]')?.textContent ?? ""), { timeout: 20000 });
    const row = await db().from("packages").select("document").where({ id }).first();
    const types = (row.document.content as { type: string; attrs?: { label?: string } }[]).map((n) => (n.attrs?.label ? `${n.type}:${n.attrs.label}` : n.type));
    expect(types).toEqual(expect.arrayContaining(["formula:F1", "truss:T1", "formula:F2"]));
    expect(types).not.toContain("paragraph:/formula");
    await page.browserContext().close();
  });
});
