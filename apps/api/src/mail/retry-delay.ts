/** First wait after a failed attempt; each further failure doubles it. */
export const RETRY_BASE_MS = 2_000;
/** The longest wait between two attempts: a server back from a long outage gets its mail within this. */
export const RETRY_CAP_MS = 15 * 60_000;

/** How long to wait after the given number of failed attempts (1 for the first failure). */
export function retryDelayMs(failedAttempts: number): number {
  const exponent = Math.min(Math.max(failedAttempts, 1) - 1, 30);
  return Math.min(RETRY_BASE_MS * 2 ** exponent, RETRY_CAP_MS);
}
