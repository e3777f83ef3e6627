// Limits of webhook delivery, from the environment (shortened in tests).
const int = (name: string, fallback: number, min = 1) => {
  const value = Number(process.env[name]);
  return Number.isFinite(value) && value >= min ? Math.round(value) : fallback;
};

export function webhookSettings() {
  return {
    /** Attempts per delivery before it is marked failed (the first one included). */
    maxAttempts: int("WEBHOOK_MAX_ATTEMPTS", 6),
    /** Waits between attempts double from the base up to the cap. */
    retryBaseSeconds: int("WEBHOOK_RETRY_BASE_SECONDS", 30),
    retryCapSeconds: int("WEBHOOK_RETRY_CAP_SECONDS", 3600),
    /** Failed attempts in a row, over all deliveries of one webhook, that pause it. */
    pauseAfterFailures: int("WEBHOOK_PAUSE_AFTER_FAILURES", 15),
    /** The whole request, from connecting to the end of the answer. */
    timeoutMs: int("WEBHOOK_TIMEOUT_MS", 5000, 100),
    /**
     * Tests and local development only: http:// to a loopback address. Never set it on a server that others
     * reach: every other private, link-local or reserved address stays refused either way.
     */
    allowLoopback: process.env.WEBHOOKS_ALLOW_LOOPBACK === "on",
  };
}

/** Seconds before attempt `next` (2 = the first retry). */
export function retryDelaySeconds(
  next: number,
  { retryBaseSeconds, retryCapSeconds }: { retryBaseSeconds: number; retryCapSeconds: number },
): number {
  return Math.min(retryCapSeconds, retryBaseSeconds * 2 ** Math.max(0, next - 2));
}

/** How much of a receiver's answer the delivery log keeps. */
export const RESPONSE_EXCERPT_CHARS = 512;
