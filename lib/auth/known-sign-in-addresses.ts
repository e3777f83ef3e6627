import "server-only";

import { db } from "@/lib/db/knex";

/** How long a client address stays known to an account after a successful sign-in from it. */
export const KNOWN_ADDRESS_DAYS = 90;

const keyOf = (email: string, ip: string) => `sign-in:known:${email}:${ip}`;

/**
 * Addresses that have signed in to an account before. Attackers spraying guesses from many addresses push an
 * account past its per-account ceiling; the owner's own addresses are exempt from that ceiling, so the attack
 * cannot hold the owner's sign-ins down. Kept as a row of the rate-limit table, dated by its last success.
 */
export async function rememberSignInAddress(email: string, ip: string): Promise<void> {
  await db("rate_limit_buckets")
    .insert({ key: keyOf(email, ip), window_start: db.fn.now(), hits: 0 })
    .onConflict("key")
    .merge({ window_start: db.fn.now(), hits: 0 });
}

export async function isKnownSignInAddress(email: string, ip: string): Promise<boolean> {
  const row = await db("rate_limit_buckets")
    .where({ key: keyOf(email, ip) })
    .whereRaw("window_start >= now() - make_interval(days => ?)", [KNOWN_ADDRESS_DAYS])
    .first("key");
  return Boolean(row);
}
