import type { SWRConfiguration } from "swr";

/** A failed answer of our JSON API, with what a retry needs to know. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly retryAfterSeconds: number | null,
  ) {
    super(`The server answered ${status}.`);
  }
}

const TRANSIENT = new Set([502, 503, 504]);
const MAX_RETRIES = 8;

/**
 * How long to wait before asking again, or null to stop: a database restart (503 with Retry-After) or a lost
 * connection is retried with capped backoff; an answer about the request itself (4xx) is not.
 */
export function retryDelayMs(error: unknown, retryCount: number): number | null {
  if (retryCount > MAX_RETRIES) return null;
  const backoff = Math.min(30_000, 1_000 * 2 ** (retryCount - 1));
  if (error instanceof ApiError) {
    if (!TRANSIENT.has(error.status)) return null;
    return error.retryAfterSeconds !== null ? Math.min(30_000, Math.max(1_000, error.retryAfterSeconds * 1000)) : backoff;
  }
  // fetch() rejected: the network or the server went away for a moment.
  return backoff;
}

export const onErrorRetry: NonNullable<SWRConfiguration["onErrorRetry"]> = (error, _key, _config, revalidate, { retryCount }) => {
  const delay = retryDelayMs(error, retryCount);
  if (delay !== null) setTimeout(() => void revalidate({ retryCount }), delay);
};
