import "server-only";

import { db } from "@/lib/db/knex";

/** Gives back one counted attempt (a sign-in that succeeded), never below zero. */
export async function refundRateLimit(key: string): Promise<void> {
  await db("rate_limit_buckets").where({ key }).andWhere("hits", ">", 0).decrement("hits", 1);
}
