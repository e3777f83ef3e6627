import "server-only";

import type { Knex } from "knex";

import { db } from "./knex";
import { maxLagSeconds, replicaDb, replicaState } from "./replica";

/**
 * The one place that decides where a read goes. Library pages, search, the public sheet API and
 * Field-results reads call `readDb()`; writes and reads that must see the user's own write (Drafting, Desk,
 * Bench, sign-in) keep using `db`, the primary.
 *
 * readDb() answers the replica when DATABASE_REPLICA_URL is set, the replica answers and is no more than
 * DATABASE_REPLICA_MAX_LAG_SECONDS behind, and this browser has not written in the last few seconds;
 * otherwise the primary. Use it for reads only, outside transactions.
 */
export async function readDb(): Promise<Knex> {
  const replica = replicaDb();
  if (!replica) return db;
  if (await pinnedToPrimary()) return db;
  return (await replicaState()).usable ? replica : db;
}

// After a write, this browser reads from the primary until the replica has surely caught up with it.
export const PRIMARY_PIN_COOKIE = "sb-read-primary";

export function pinSeconds(): number {
  return Math.ceil(maxLagSeconds()) + 3;
}

// Imported on use: scripts and jobs (seeds, benchmarks) load this module outside Next, without a replica.
const nextRequest = async () => {
  const [{ cookies }, { unstable_rethrow }] = await Promise.all([import("next/headers"), import("next/navigation")]);
  return { cookies, unstable_rethrow };
};

async function pinnedToPrimary(): Promise<boolean> {
  const { cookies, unstable_rethrow } = await nextRequest();
  try {
    return (await cookies()).has(PRIMARY_PIN_COOKIE);
  } catch (error) {
    // Outside a request (scripts, jobs) there are no cookies; Next's own signals must pass through.
    unstable_rethrow(error);
    return false;
  }
}

/** Called after a successful write in a server action. */
export async function pinReadsToPrimary(): Promise<void> {
  if (!replicaDb()) return;
  const { cookies, unstable_rethrow } = await nextRequest();
  try {
    (await cookies()).set(PRIMARY_PIN_COOKIE, "1", { maxAge: pinSeconds(), httpOnly: true, sameSite: "lax", path: "/" });
  } catch (error) {
    unstable_rethrow(error);
  }
}

/** The same pin for route handlers, which answer with a Response of their own. */
export function pinCookieHeader(): string | null {
  return replicaDb() ? `${PRIMARY_PIN_COOKIE}=1; Max-Age=${pinSeconds()}; Path=/; HttpOnly; SameSite=Lax` : null;
}
