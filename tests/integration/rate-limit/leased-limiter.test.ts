import { randomUUID } from "node:crypto";
import { describe, expect, it } from "vitest";

import { db } from "@/lib/db/knex";
import { RateLimited } from "@/lib/errors/domain-errors";
import { consumeRateLimit, resetRateLimit } from "@/lib/rate-limit/consume-rate-limit";
import { createLeasedLimiter, leaseSize } from "@/lib/rate-limit/leased-limiter";

const bucketHits = async (key: string) =>
  (await db("rate_limit_buckets").where({ key }).first<{ hits: number } | undefined>("hits"))?.hits ?? 0;

/** Calls `consume` `count` times, `parallel` at a time; returns how many were let through. */
async function spend(consume: () => Promise<number>, count: number, parallel = 8) {
  let allowed = 0;
  let next = 0;
  await Promise.all(
    Array.from({ length: parallel }, async () => {
      while (next++ < count) {
        try {
          await consume();
          allowed++;
        } catch (error) {
          if (!(error instanceof RateLimited)) throw error;
        }
      }
    }),
  );
  return allowed;
}

describe("leased rate limiter", () => {
  it("lets three instances together through exactly the limit, never more", async () => {
    const key = `test:${randomUUID()}`;
    const limit = { key, limit: 300, windowSeconds: 60 };
    const instances = [createLeasedLimiter(db), createLeasedLimiter(db), createLeasedLimiter(db)];
    const allowed = await Promise.all(instances.map((l) => spend(() => l.consume(limit), 200)));
    const total = allowed.reduce((a, b) => a + b, 0);
    // 600 asked for 300: the leases spend the whole budget, no hit twice; at most the last partial leases go unspent.
    expect(total).toBeLessThanOrEqual(300);
    expect(total).toBeGreaterThanOrEqual(300 - instances.length * leaseSize(300));
    expect(await bucketHits(key)).toBeGreaterThanOrEqual(total);
  });

  it("writes once per lease, not once per call", async () => {
    const key = `test:${randomUUID()}`;
    const limiter = createLeasedLimiter(db);
    const limit = { key, limit: 1000, windowSeconds: 60 };
    await spend(() => limiter.consume(limit), 100);
    // 100 calls on leases of 20: five leases, so the bucket holds exactly the 100 leased hits.
    expect(leaseSize(1000)).toBe(20);
    expect(await bucketHits(key)).toBe(100);
  });

  it("counts small limits and count-only calls exactly, one hit per call", async () => {
    const key = `test:${randomUUID()}`;
    const limiter = createLeasedLimiter(db);
    for (let i = 1; i <= 5; i++) await expect(limiter.consume({ key, limit: 5, windowSeconds: 60 })).resolves.toBe(i);
    await expect(limiter.consume({ key, limit: 5, windowSeconds: 60 })).rejects.toBeInstanceOf(RateLimited);
    const counted = `test:${randomUUID()}`;
    for (let i = 0; i < 3; i++) await limiter.consume({ key: counted, limit: Number.MAX_SAFE_INTEGER, windowSeconds: 60 });
    expect(await bucketHits(counted)).toBe(3);
  });

  it("refuses from the local lease once the shared budget is gone, with a retry time", async () => {
    const key = `test:${randomUUID()}`;
    await db("rate_limit_buckets").insert({ key, window_start: db.fn.now(), hits: 150 });
    const limiter = createLeasedLimiter(db);
    const error = await limiter.consume({ key, limit: 150, windowSeconds: 60 }).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(RateLimited);
    expect((error as RateLimited).retryAfterSeconds).toBeGreaterThan(0);
    // The refusal is remembered until the window ends: no further write.
    await expect(limiter.consume({ key, limit: 150, windowSeconds: 60 })).rejects.toBeInstanceOf(RateLimited);
    expect(await bucketHits(key)).toBe(153);
  });

  it("keeps consumeRateLimit's contract: hits so far, RateLimited past the limit, reset starts over", async () => {
    const key = `test:${randomUUID()}`;
    const hits = [];
    for (let i = 0; i < 3; i++) hits.push(await consumeRateLimit({ key, limit: 200, windowSeconds: 60 }));
    expect(hits).toEqual([1, 2, 3]);
    await resetRateLimit(key);
    await expect(consumeRateLimit({ key, limit: 200, windowSeconds: 60 })).resolves.toBe(1);
  });
});
