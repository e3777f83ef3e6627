import "server-only";

import { db } from "@/lib/db/knex";

/** The id of the account that proved this address, if any (an unconfirmed sign-up does not count). */
export async function findConfirmedAccount(email: string): Promise<string | null> {
  const row = await db("users").where({ email }).whereNotNull("email_verified").first<{ id: string } | undefined>("id");
  return row?.id ?? null;
}
