import type { Knex } from "knex";
import { closeDb } from "../knex";
import { stopBoss } from "../../lib/jobs/boss";
import { playDemoHistory } from "../demo/demo-history";

/**
 * The footbridge package's history (remarks, Rev 0, plan-review comments, a
 * draft Rev 1). `npm test` seeds without it (PP_SEED_HISTORY=0) because its
 * end-to-end test walks the same package from draft to Rev 0 in the browser.
 */
export async function seed(_knex: Knex): Promise<void> {
  if (process.env.PP_SEED_HISTORY === "0") return;
  try {
    await playDemoHistory();
  } finally {
    // The history queues its review mail through pg-boss and the app's own pool; close both so the seed exits.
    await stopBoss();
    await closeDb();
  }
}
