import "server-only";

import { db } from "@/lib/db/knex";
import { RateLimited } from "@/lib/errors/domain-errors";

import { createLeasedLimiter } from "./leased-limiter";

type Limit = { key: string; limit: number; windowSeconds: number };

// One limiter per server process; the global survives hot reloads in development.
const globalForLimiter = globalThis as unknown as { swarfbookLimiter?: ReturnType<typeof createLeasedLimiter> };
const limiter = (globalForLimiter.swarfbookLimiter ??= createLeasedLimiter(db));

/**
 * Fixed-window counter in PostgreSQL, so a limit holds across app instances; generous limits are spent
 * from small local leases of the bucket (see leased-limiter.ts), so most calls write nothing.
 * Returns the hits in the current window; throws RateLimited past the limit.
 */
export async function consumeRateLimit({ key, limit, windowSeconds }: Limit): Promise<number> {
  return limiter.consume({ key, limit, windowSeconds });
}

export async function resetRateLimit(key: string): Promise<void> {
  limiter.forget(key);
  await db("rate_limit_buckets").where({ key }).delete();
}

/** Throw RateLimited if the key is already past its limit, without counting this call. */
export async function assertUnderRateLimit({ key, limit, windowSeconds }: Limit): Promise<void> {
  const row = await db("rate_limit_buckets")
    .where({ key })
    .whereRaw("window_start >= now() - make_interval(secs => ?)", [windowSeconds])
    .first<{ hits: number; window_start: Date } | undefined>("hits", "window_start");
  if (row && row.hits >= limit) {
    throw new RateLimited(Math.max(1, Math.ceil(windowSeconds - (Date.now() - new Date(row.window_start).getTime()) / 1000)));
  }
}
