import "server-only";

import type { Knex } from "knex";

import { RateLimited } from "@/lib/errors/domain-errors";

import { takeFromBucket } from "./take-from-bucket";

type Limit = { key: string; limit: number; windowSeconds: number };
// `exhausted`: the bucket could not grant the whole lease, so the window's budget is gone for every instance.
type Lease = { left: number; hitsBefore: number; used: number; expiresAt: number; exhausted: boolean };

// Leases pay off for generous limits only; a small limit (sign-up, magic links) is counted exactly, one write a call.
const LEASE_MIN_LIMIT = 100;
// A limit of Number.MAX_SAFE_INTEGER marks a call that only counts (failed sign-ins, read back by
// assertUnderRateLimit): its bucket must hold the exact count, so it is never leased.
const LEASE_MAX_LIMIT = 2 ** 31 - 1;
const MAX_KEYS = 10_000;

/** Hits taken per lease: a fiftieth of the limit, 2 to 100, so idle leases on other instances cost at most 2 % each. */
export function leaseSize(limit: number): number {
  if (limit < LEASE_MIN_LIMIT || limit > LEASE_MAX_LIMIT) return 1;
  return Math.max(2, Math.min(100, Math.floor(limit / 50)));
}

/**
 * A fixed-window limiter whose budget lives in PostgreSQL, so it holds across app instances, but which takes
 * a small lease of hits at a time and spends it in this process: one write per lease instead of per call.
 * Leased hits count in the bucket at once, so all instances together never pass the limit; an unspent lease
 * only makes the others refuse a little early, and it lapses with its window.
 */
export function createLeasedLimiter(knex: Knex) {
  const leases = new Map<string, Lease>();
  const inFlight = new Map<string, Promise<unknown>>();

  function spend(key: string): number | null {
    const lease = leases.get(key);
    if (!lease || Date.now() >= lease.expiresAt) return null;
    if (lease.left <= 0) {
      if (lease.exhausted) throw new RateLimited(Math.max(1, Math.ceil((lease.expiresAt - Date.now()) / 1000)));
      return null;
    }
    lease.left--;
    lease.used++;
    return lease.hitsBefore + lease.used;
  }

  async function consumeExactly(limit: Limit): Promise<number> {
    const grant = await takeFromBucket(knex, limit, 1);
    if (grant.granted === 0) throw new RateLimited(Math.max(1, Math.ceil(grant.secondsLeft)));
    return grant.hitsBefore + 1;
  }

  async function renew(limit: Limit, size: number) {
    const grant = await takeFromBucket(knex, limit, size);
    if (leases.size >= MAX_KEYS) for (const [k, l] of leases) if (Date.now() >= l.expiresAt) leases.delete(k);
    if (leases.size >= MAX_KEYS) leases.clear();
    leases.set(limit.key, {
      left: grant.granted,
      hitsBefore: grant.hitsBefore,
      used: 0,
      expiresAt: Date.now() + grant.secondsLeft * 1000,
      exhausted: grant.granted < size,
    });
  }

  /** Returns the hits in the current window (this call included); throws RateLimited past the limit. */
  async function consume(limit: Limit): Promise<number> {
    const size = leaseSize(limit.limit);
    if (size === 1) return consumeExactly(limit);
    // Concurrent calls on an empty lease wait for one renewal instead of each writing.
    for (let round = 0; ; round++) {
      const hits = spend(limit.key);
      if (hits !== null) return hits;
      // A lease that lapses as it arrives (the window's last instant) is renewed a few times, then counted exactly.
      if (round === 4) return consumeExactly(limit);
      const pending = inFlight.get(limit.key);
      if (pending) {
        await pending;
        continue;
      }
      const renewal = renew(limit, size).finally(() => inFlight.delete(limit.key));
      inFlight.set(limit.key, renewal);
      await renewal;
    }
  }

  return { consume, forget: (key: string) => void leases.delete(key) };
}
