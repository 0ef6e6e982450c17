import { boss, superviseQueues } from "./boss";
import { handlers } from "./handlers";
import type { QueueName } from "./queues";

/**
 * Makes this process a worker: it supervises the queues (expiry, retries) and
 * works every queue with its handler. scripts/worker.ts calls it; so do the
 * tests that watch a job go through, so they exercise the worker's own code.
 */
export async function workQueues(options: { pollingIntervalSeconds?: number } = {}): Promise<QueueName[]> {
  superviseQueues();
  const b = await boss();
  const names = Object.keys(handlers) as QueueName[];
  for (const name of names) {
    await b.work<object>(name, { pollingIntervalSeconds: options.pollingIntervalSeconds ?? 1 }, async (jobs) => {
      for (const job of jobs) await handlers[name](job);
    });
  }
  return names;
}
