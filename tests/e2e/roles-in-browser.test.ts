import { describe, expect, it } from "vitest";
import { BASE_URL } from "../support/api-client";
import { browserSuite } from "../support/browser-suite";
import { signInPage, textOf, waitForPath } from "../support/browser-session";
import { demoLogin, otherFirmLogin } from "../support/demo-fixtures";

const suite = browserSuite();

const cases = [
  { who: "engineer", login: demoLogin("engineer"), sees: ["Alder Creek Footbridge", "Millbrook Market Hall roof"], role: "Engineer" },
  { who: "checker", login: demoLogin("checker"), sees: ["Alder Creek Footbridge"], role: "Checker" },
  { who: "project engineer", login: demoLogin("projectEngineer"), sees: ["Alder Creek Footbridge", "Millbrook Market Hall roof"], role: "Project engineer" },
  { who: "firm admin", login: demoLogin("admin"), sees: ["Alder Creek Footbridge", "Millbrook Market Hall roof"], role: "Firm admin (not a member)" },
  { who: "another firm's admin", login: otherFirmLogin, sees: ["Quarry Road canopy"], role: null },
] as const;

const allProjects = ["Alder Creek Footbridge", "Millbrook Market Hall roof", "Quarry Road canopy"];

describe("each demo role in the real browser", () => {
  for (const c of cases) {
    it(`signs in as the ${c.who}, sees who is signed in and only the projects the role allows`, async () => {
      const page = await signInPage(suite.browser, c.login.email, c.login.password);
      expect(page.url()).toBe(`${BASE_URL}/projects`);
      expect(await textOf(page, '[data-testid="signed-in-as"]')).toContain(c.login.name);
      const table = await textOf(page, "table");
      for (const name of allProjects) {
        if ((c.sees as readonly string[]).includes(name)) expect(table).toContain(name);
        else expect(table).not.toContain(name);
      }
      await page.goto(`${BASE_URL}/projects/${suite.ids.footbridgeId}`, { waitUntil: "networkidle0" });
      if (c.role) expect(await textOf(page, '[data-testid="project-role"]')).toContain(c.role);
      else expect(await page.content()).toContain("Not found");
      await page.browserContext().close();
    });
  }

  it("shows the checker no way to start a package, and the engineer one", async () => {
    const checker = await signInPage(suite.browser, demoLogin("checker").email, demoLogin("checker").password);
    await checker.goto(`${BASE_URL}/projects/${suite.ids.footbridgeId}`, { waitUntil: "networkidle0" });
    expect(await checker.$('form[aria-label="New package"]')).toBeNull();
    await checker.browserContext().close();
    const engineer = await signInPage(suite.browser, demoLogin("engineer").email, demoLogin("engineer").password);
    await engineer.goto(`${BASE_URL}/projects/${suite.ids.footbridgeId}`, { waitUntil: "networkidle0" });
    expect(await engineer.$('form[aria-label="New package"]')).not.toBeNull();
    await engineer.browserContext().close();
  });

  it("signs out back to the sign-in page, after which the projects page asks to sign in again", async () => {
    const page = await signInPage(suite.browser, demoLogin("engineer").email, demoLogin("engineer").password);
    await page.click("header button");
    await waitForPath(page, "/sign-in");
    await page.goto(`${BASE_URL}/projects`, { waitUntil: "networkidle0" });
    expect(new URL(page.url()).pathname).toBe("/sign-in");
    await page.browserContext().close();
  });

  it("shows a wrong password as a message on the form", async () => {
    const page = await signInPage(suite.browser, demoLogin("checker").email, "not-the-password");
    expect(await textOf(page, '[role="alert"]')).toContain("E-mail or password is not right.");
    await page.browserContext().close();
  });
});
