import type { Browser } from "puppeteer-core";
import { afterAll, beforeAll } from "vitest";
import { closeDb } from "@/db/knex";
import { launchBrowser } from "./browser";
import { demoIds } from "./demo-fixtures";

export type BrowserSuite = { browser: Browser; ids: Awaited<ReturnType<typeof demoIds>> };

/**
 * One Chromium for a test file, opened before its tests and closed after,
 * with the demo ids looked up; returns an object filled in by beforeAll.
 */
export function browserSuite(): BrowserSuite {
  const suite = {} as BrowserSuite;
  let close: (() => Promise<void>) | undefined;
  beforeAll(async () => {
    const launched = await launchBrowser();
    suite.browser = launched.browser;
    close = launched.close;
    suite.ids = await demoIds();
  });
  afterAll(async () => {
    await close?.();
    await closeDb();
  });
  return suite;
}
