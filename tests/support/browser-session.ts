import type { Browser, Page } from "puppeteer-core";
import { BASE_URL } from "./api-client";

/**
 * Signs in through the real form, in a fresh browser context (no cookies shared
 * between people). Resolves once the app has moved on, or the form shows an error.
 */
export async function signInPage(browser: Browser, email: string, password: string): Promise<Page> {
  const context = await browser.createBrowserContext();
  const page = await context.newPage();
  await page.setViewport({ width: 1280, height: 900 });
  await page.goto(`${BASE_URL}/sign-in`, { waitUntil: "networkidle0" });
  await page.type('input[type="email"]', email);
  await page.type('input[type="password"]', password);
  await page.click('button[type="submit"]');
  await page.waitForFunction(() => location.pathname !== "/sign-in" || document.querySelector('[role="alert"]'), { timeout: 20000 });
  await page.waitForNetworkIdle({ idleTime: 200 });
  return page;
}

export async function waitForPath(page: Page, pathname: string): Promise<void> {
  await page.waitForFunction((p) => location.pathname === p, { timeout: 20000 }, pathname);
  await page.waitForNetworkIdle({ idleTime: 200 });
}

export async function textOf(page: Page, selector: string): Promise<string> {
  await page.waitForSelector(selector);
  return page.$eval(selector, (el) => (el as HTMLElement).innerText);
}
