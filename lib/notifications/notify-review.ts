import type { Knex } from "knex";
import { sendJob } from "@/lib/jobs/send-job";
import type { ReviewEvent } from "./review-event";

/**
 * Queues the e-mail for a review event once the transaction that made it has
 * committed (a rolled-back action mails no one). Queuing never fails the
 * action: the person has done their part; a queue that is down is logged.
 */
export function notifyAfterCommit(trx: Knex.Transaction, event: ReviewEvent): void {
  trx.executionPromise.then(
    () => notifyReview(event),
    () => undefined,
  );
}

export async function notifyReview(event: ReviewEvent): Promise<void> {
  try {
    await sendJob("notify.review", event);
  } catch (e) {
    console.error(`[notify] could not queue ${event.kind} for package ${event.packageId}:`, e instanceof Error ? e.message : e);
  }
}
