import { describe, expect, it } from "vitest";
import { BASE_URL } from "../support/api-client";
import { browserSuite } from "../support/browser-suite";
import { signInPage, textOf, waitForPath } from "../support/browser-session";
import { demoIds, demoLogin } from "../support/demo-fixtures";

const suite = browserSuite();

describe("inviting a member, end to end", () => {
  it("the project engineer invites a checker, the mail arrives, the link sets a password and the invitee signs in with that role", async () => {
    const { footbridgeId } = await demoIds();
    const email = `invitee-${Date.now()}@test.example`;
    const pe = await signInPage(suite.browser, demoLogin("projectEngineer").email, demoLogin("projectEngineer").password);
    await pe.goto(`${BASE_URL}/projects/${footbridgeId}/members`, { waitUntil: "networkidle0" });
    const form = 'form[aria-label="Invite a member"]';
    await pe.type(`${form} input:not([type="email"])`, "Ines Invitee");
    await pe.type(`${form} input[type="email"]`, email);
    await pe.select(`${form} select`, "checker");
    await pe.click(`${form} button[type="submit"]`);
    await pe.waitForFunction((e) => document.querySelector("table")?.textContent?.includes(e), {}, email);

    await pe.goto(`${BASE_URL}/dev/mail`, { waitUntil: "networkidle0" });
    const mail = await textOf(pe, '[data-testid="captured-mail"]');
    expect(mail).toContain(email);
    expect(mail).toContain("invited you to Panelpoint");
    const link = mail.match(/https?:\/\/\S+\/invitation\/[A-Za-z0-9_-]+/)?.[0];
    expect(link).toBeTruthy();
    await pe.browserContext().close();

    const ctx = await suite.browser.createBrowserContext();
    const page = await ctx.newPage();
    await page.goto(link!.replace(/^https?:\/\/[^/]+/, BASE_URL), { waitUntil: "networkidle0" });
    expect(await textOf(page, "h1")).toContain("Ines Invitee");
    const [pw, repeat] = await page.$$('input[type="password"]');
    await pw.type("invitee-password-1");
    await repeat.type("invitee-password-1");
    await page.click('button[type="submit"]');
    await waitForPath(page, "/sign-in");
    await ctx.close();

    const invitee = await signInPage(suite.browser, email, "invitee-password-1");
    await invitee.goto(`${BASE_URL}/projects/${footbridgeId}`, { waitUntil: "networkidle0" });
    expect(await textOf(invitee, '[data-testid="project-role"]')).toContain("Checker");
    await invitee.browserContext().close();
  });
});
