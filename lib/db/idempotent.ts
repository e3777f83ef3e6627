import "server-only";

import type { Knex } from "knex";

/**
 * Serialises writes that carry the same idempotency key (within the transaction), so the second of two
 * concurrent resubmits sees the first one's row instead of racing it into a unique violation.
 */
export async function lockIdempotencyKey(trx: Knex.Transaction, scope: string, key: string): Promise<void> {
  await trx.raw("select pg_advisory_xact_lock(hashtextextended(?, 11))", [`${scope}:${key}`]);
}
