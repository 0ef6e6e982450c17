/**
 * `npm run bench:editor`: the real package page in the real Chromium. Builds packages of 50 and 200
 * calcs (trusses and a chain of formulas that read each other), changes the first formula's input,
 * and measures, inside the page, the time from the input event to the last dependent value updated
 * on screen; also the JavaScript the editor route loads.
 * Needs the app running (`npm run demo`, or BENCH_BASE_URL) and its database (DATABASE_URL).
 */
import { randomUUID } from "node:crypto";
import { closeDb, db } from "../db/knex";
import { DEMO_PASSWORD, demoPeople } from "../db/demo/people";
import { calcDefaults } from "../lib/calcs/calc-defaults";
import { launchBrowser } from "../tests/support/browser";

const BASE = process.env.BENCH_BASE_URL ?? process.env.APP_URL ?? "http://localhost:3000";

/**
 * `chained`: every formula reads the one before (a change ripples through all of them, the worst case).
 * Otherwise formulas come in groups of five that read each other, as a load change reaches a few calcs.
 */
function benchDocument(calcs: number, chained: boolean) {
  const content: unknown[] = [{ type: "heading", attrs: { level: 1 }, content: [{ type: "text", text: `Benchmark package, ${calcs} calcs` }] }];
  let f = 0;
  let t = 0;
  for (let i = 0; i < calcs; i++) {
    if (i % 5 === 4) {
      t++;
      content.push({ type: "truss", attrs: { id: randomUUID(), label: `T${t}`, inputs: calcDefaults("truss") } });
    } else {
      f++;
      const startsGroup = chained ? f === 1 : (f - 1) % 5 === 0;
      const source = startsGroup ? "x = 10 kN" : `x = F${f - 1}.x + 1 kN`;
      content.push({ type: "formula", attrs: { id: randomUUID(), label: `F${f}`, inputs: { source, preferredUnits: "SI" } } });
    }
    content.push({ type: "paragraph", content: [{ type: "text", text: `Narrative between calcs, number ${i + 1}.` }] });
  }
  // The edited formula: the first of the last group (or F1 when chained); the watched one: the last formula.
  const edited = chained ? "F1" : `F${Math.floor((f - 1) / 5) * 5 + 1}`;
  return { doc: { type: "doc", content }, lastFormula: `F${f}`, edited };
}

async function main() {
  const project = await db().from("projects").select("id").where({ jobNumber: "KV-2026-014" }).first();
  if (!project) throw new Error("The demo project KV-2026-014 is not in this database: run `npm run demo` first.");
  const engineer = demoPeople.find((p) => p.key === "engineer")!;
  const { browser, close } = await launchBrowser();
  console.log(`Editor benchmark against ${BASE} (median of 15 input changes after 3 warm-ups)\n`);
  console.log("  calcs   change reaches      recompute (perf mark)   input → last value on screen   editor JS");
  try {
    for (const [n, chained] of [[50, false], [200, false], [50, true], [200, true]] as const) {
      const { doc, lastFormula, edited } = benchDocument(n, chained);
      const [pkg] = await db().insert({ projectId: project.id, title: `Benchmark ${n} calcs ${new Date().toISOString()}`, document: JSON.stringify(doc) }).into("packages").returning("id");
      const ctx = await browser.createBrowserContext();
      const page = await ctx.newPage();
      let jsBytes = 0;
      page.on("response", async (r) => {
        if (r.url().includes("/_next/static/") && r.url().endsWith(".js")) jsBytes += (await r.buffer().catch(() => Buffer.alloc(0))).length;
      });
      await page.goto(`${BASE}/sign-in`, { waitUntil: "networkidle0" });
      await page.type('input[type="email"]', engineer.email);
      await page.type('input[type="password"]', DEMO_PASSWORD);
      await page.click('button[type="submit"]');
      await page.waitForFunction(() => location.pathname !== "/sign-in");
      jsBytes = 0;
      await page.goto(`${BASE}/projects/${project.id}/packages/${pkg.id}`, { waitUntil: "networkidle0" });
      await page.waitForSelector(`[data-calc-label="${lastFormula}"]`);
      const runs: { mark: number; screen: number }[] = [];
      for (let i = 0; i < 18; i++) {
        const r = await changeAndWait(page, edited, lastFormula, 10 + i + 1);
        if (i >= 3) runs.push(r);
      }
      const med = (xs: number[]) => xs.sort((a, b) => a - b)[Math.floor(xs.length / 2)];
      const reach = chained ? `all ${Math.round(n * 0.8)} formulas` : "5 formulas";
      console.log(`  ${String(n).padStart(5)}   ${reach.padEnd(17)}   ${med(runs.map((r) => r.mark)).toFixed(2).padStart(10)} ms   ${med(runs.map((r) => r.screen)).toFixed(2).padStart(20)} ms   ${(jsBytes / 1024).toFixed(0).padStart(8)} KiB`);
      await ctx.close();
      await db().from("packages").where({ id: pkg.id }).delete();
    }
    console.log("\nTargets: ≤ 16 ms for 50 calcs, ≤ 50 ms for 200 (one frame).");
  } finally {
    await close();
    await closeDb();
  }
}

/**
 * Runs in the page: types a new value into F1 and resolves when the last formula's value on screen
 * changed. Kept as source text because tsx's helpers do not exist inside the page.
 */
const changeAndWaitSource = `(editedLabel, lastLabel, value) => {
  const area = document.querySelector('[data-calc-label="' + editedLabel + '"] textarea');
  const target = document.querySelector('[data-calc-label="' + lastLabel + '"]');
  const before = target.innerText;
  performance.clearMeasures("panelpoint:recompute");
  return new Promise((resolve) => {
    const start = performance.now();
    const done = () => {
      const m = performance.getEntriesByName("panelpoint:recompute").pop();
      resolve({ mark: m ? m.duration : -1, screen: performance.now() - start });
    };
    const obs = new MutationObserver(() => {
      if (target.innerText !== before) { obs.disconnect(); done(); }
    });
    obs.observe(target, { subtree: true, childList: true, characterData: true });
    const setter = Object.getOwnPropertyDescriptor(HTMLTextAreaElement.prototype, "value").set;
    setter.call(area, "x = " + value + " kN");
    area.dispatchEvent(new Event("input", { bubbles: true }));
  });
}`;

function changeAndWait(page: import("puppeteer-core").Page, editedLabel: string, lastLabel: string, value: number): Promise<{ mark: number; screen: number }> {
  return page.evaluate(`(${changeAndWaitSource})(${JSON.stringify(editedLabel)}, ${JSON.stringify(lastLabel)}, ${value})`) as Promise<{ mark: number; screen: number }>;
}

await main();
