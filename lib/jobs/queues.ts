/**
 * The queues and how hard each retries. Mail is cheap to retry and must not
 * be lost; a review event fans out into one mail job per recipient so that a
 * failed address does not resend everyone else's copy.
 */
export const queues = {
  "notify.review": { retryLimit: 5, retryDelay: 5, retryBackoff: true },
  "mail.send": { retryLimit: 8, retryDelay: 5, retryBackoff: true },
} as const;

export type QueueName = keyof typeof queues;
