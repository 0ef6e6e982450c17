import PgBoss from "pg-boss";
import { env } from "@/lib/env";
import { queues } from "./queues";

let started: Promise<PgBoss> | undefined;
let supervise = false;

/** The worker supervises the queues (expiry, retries, archiving); senders — the web app, tests — only insert jobs. */
export function superviseQueues(): void {
  supervise = true;
}

/**
 * One pg-boss per process, on the application's own database (schema pgboss),
 * so a queued job commits and survives like any other row. The app only sends;
 * scripts/worker.ts works the queues.
 */
export function boss(): Promise<PgBoss> {
  started ??= (async () => {
    const b = new PgBoss({ connectionString: env().DATABASE_URL, schema: "pgboss", max: 3, supervise, schedule: false });
    b.on("error", (e) => console.error("[jobs]", e instanceof Error ? e.message : e));
    await b.start();
    for (const [name, policy] of Object.entries(queues)) await b.createQueue(name, { name, ...policy });
    return b;
  })().catch((e) => {
    started = undefined;
    throw e;
  });
  return started;
}

export async function stopBoss(): Promise<void> {
  const b = started;
  started = undefined;
  if (b) await (await b).stop({ graceful: true, wait: true });
}
