import puppeteer, { type Browser } from "puppeteer-core";

let launching: Promise<Browser> | null = null;

/** The Chromium the exports print with: CHROMIUM_PATH when set (lib/env.ts does not list it yet), else the system one. */
function executablePath(): string {
  return process.env.CHROMIUM_PATH || "/usr/bin/chromium";
}

/**
 * The one headless Chromium of this process, launched on first use and
 * again if it crashed or was closed: starting Chromium costs far more than a
 * render, and one browser serves every page.
 */
export async function getBrowser(): Promise<Browser> {
  if (launching) {
    const browser = await launching.catch(() => null);
    if (browser?.connected) return browser;
    launching = null;
  }
  launching = puppeteer.launch({
    executablePath: executablePath(),
    headless: true,
    // --no-sandbox: the worker runs in a container as a user without the namespaces Chromium's sandbox needs.
    args: ["--no-sandbox", "--disable-dev-shm-usage", "--disable-gpu", "--font-render-hinting=none"],
  });
  const browser = await launching;
  browser.once("disconnected", () => {
    launching = null;
  });
  return browser;
}

/** The browser's process id, for memory figures; null when none is running. */
export async function browserPid(): Promise<number | null> {
  if (!launching) return null;
  const browser = await launching.catch(() => null);
  return browser?.process()?.pid ?? null;
}

/** Closes the browser, for shutdown and for tests. */
export async function closeBrowser(): Promise<void> {
  const pending = launching;
  launching = null;
  const browser = await pending?.catch(() => null);
  if (browser?.connected) await browser.close();
}
