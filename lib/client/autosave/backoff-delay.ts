/** Waits between retries while the server is unreachable: quick at first, then a steady 10 s. */
const steps = [1000, 2000, 5000, 10000] as const;

/** Delay in milliseconds before retry number `attempt` (0 = the first retry). */
export function backoffDelay(attempt: number): number {
  return steps[Math.min(Math.max(0, Math.floor(attempt)), steps.length - 1)];
}
