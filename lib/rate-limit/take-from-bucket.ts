import "server-only";

import type { Knex } from "knex";

type Limit = { key: string; limit: number; windowSeconds: number };

export type BucketGrant = { granted: number; hitsBefore: number; secondsLeft: number };

/**
 * Adds `take` hits to the key's fixed-window bucket in PostgreSQL (one statement, so instances never
 * double-spend) and answers how many of them fit under the limit, the hits before them and the window's
 * remaining seconds. The hits stay counted even when they do not fit, like a refused request.
 */
export async function takeFromBucket(knex: Knex, { key, limit, windowSeconds }: Limit, take: number): Promise<BucketGrant> {
  const { rows } = await knex.raw<{ rows: { hits: number; seconds_left: number }[] }>(
    `insert into rate_limit_buckets as b (key, window_start, hits) values (?, now(), ?)
     on conflict (key) do update set
       hits = case when b.window_start < now() - make_interval(secs => ?) then excluded.hits else b.hits + excluded.hits end,
       window_start = case when b.window_start < now() - make_interval(secs => ?) then now() else b.window_start end
     returning hits, extract(epoch from b.window_start + make_interval(secs => ?) - now())::float8 as seconds_left`,
    [key, take, windowSeconds, windowSeconds, windowSeconds],
  );
  const hitsBefore = rows[0].hits - take;
  return { granted: Math.max(0, Math.min(take, limit - hitsBefore)), hitsBefore, secondsLeft: Math.max(0, rows[0].seconds_left) };
}
