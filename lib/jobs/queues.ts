/**
 * The queues and how hard each retries. Mail is cheap to retry and must not
 * be lost; a review event fans out into one mail job per recipient so that a
 * failed address does not resend everyone else's copy.
 */
export const queues = {
  "notify.review": { retryLimit: 5, retryDelay: 5, retryBackoff: true },
  "mail.send": { retryLimit: 8, retryDelay: 5, retryBackoff: true },
  // Rendering a package takes seconds to minutes; a job whose worker died (or whose Chromium hung)
  // expires after ten minutes and is retried like a failure. lib/exports/run-export.ts counts the
  // attempts itself, so the last one marks the export failed instead of leaving it queued.
  "export.render": { retryLimit: 3, retryDelay: 10, retryBackoff: true, expireInSeconds: 600 },
} as const;

export type QueueName = keyof typeof queues;
