import { afterAll, describe, expect, it } from "vitest";
import { closeDb } from "@/db/knex";
import { findExport } from "@/lib/data/exports";
import { findProjectAccess } from "@/lib/data/projects";
import { createExport } from "@/lib/exports/create-export";
import { runExport } from "@/lib/exports/run-export";
import { stopBoss } from "@/lib/jobs/boss";
import { browserPid, closeBrowser } from "@/lib/report/pdf/browser";
import { reviewTeam } from "./review-fixtures";

afterAll(async () => {
  await closeBrowser();
  await stopBoss();
  await closeDb();
});

/** Kills the export's Chromium as soon as it is running (SIGKILL: a crash, not a clean close). */
async function killChromiumOnceStarted(): Promise<number> {
  for (let i = 0; i < 1500; i++) {
    const pid = await browserPid();
    if (pid) {
      process.kill(pid, "SIGKILL");
      return pid;
    }
    await new Promise((r) => setTimeout(r, 10));
  }
  throw new Error("Chromium never started");
}

describe("a Chromium crash during an export", () => {
  it("fails that attempt with a retry queued, and the next attempt renders the file", { timeout: 180_000 }, async () => {
    await closeBrowser();
    const t = await reviewTeam();
    const access = await findProjectAccess(t.engineer, t.project.id);
    const row = await createExport({ actor: t.engineer, access: access!, packageId: t.packageId, format: "pdf" });

    const attempt = runExport({ exportId: row.id });
    const killed = await killChromiumOnceStarted();
    await expect(attempt).rejects.toThrow();
    const between = await findExport(t.firm.id, row.id);
    expect(between).toMatchObject({ status: "queued", attempts: 1 });
    // Killed mid-render it reports the renderer stopped; killed while still launching, the launch times out. Either way the attempt fails and is retried.
    expect(between?.error).toMatch(/^Attempt 1 of 4 failed \((the PDF renderer \(Chromium\) stopped unexpectedly|Timed out after waiting).*\); trying again\.$/);

    // The queue's retry: a fresh Chromium is launched and the export completes.
    await runExport({ exportId: row.id });
    expect(await browserPid()).not.toBe(killed);
    expect(await findExport(t.firm.id, row.id)).toMatchObject({ status: "done", attempts: 2, error: null });
  });
});
