import "server-only";

import type { Knex } from "knex";

import { db } from "@/lib/db/knex";

/** Ends every session of a person issued before now (their session tokens carry an older epoch). */
export async function endSessions(userId: string, trx: Knex | Knex.Transaction = db): Promise<void> {
  await trx("users").where({ id: userId }).increment("session_epoch", 1);
}
