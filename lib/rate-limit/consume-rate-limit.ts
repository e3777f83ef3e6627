import "server-only";

import { db } from "@/lib/db/knex";
import { RateLimited } from "@/lib/errors/domain-errors";

type Limit = { key: string; limit: number; windowSeconds: number };

/**
 * Fixed-window counter in PostgreSQL, so a limit holds across app instances.
 * Returns the hits in the current window; throws RateLimited past the limit.
 */
export async function consumeRateLimit({ key, limit, windowSeconds }: Limit): Promise<number> {
  const { rows } = await db.raw<{ rows: { hits: number; window_start: Date }[] }>(
    `insert into rate_limit_buckets (key, window_start, hits) values (?, now(), 1)
     on conflict (key) do update set
       hits = case when rate_limit_buckets.window_start < now() - make_interval(secs => ?) then 1 else rate_limit_buckets.hits + 1 end,
       window_start = case when rate_limit_buckets.window_start < now() - make_interval(secs => ?) then now() else rate_limit_buckets.window_start end
     returning hits, window_start`,
    [key, windowSeconds, windowSeconds],
  );
  const { hits, window_start } = rows[0];
  if (hits > limit) {
    const retry = Math.max(1, Math.ceil(windowSeconds - (Date.now() - new Date(window_start).getTime()) / 1000));
    throw new RateLimited(retry);
  }
  return hits;
}

export async function resetRateLimit(key: string): Promise<void> {
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
