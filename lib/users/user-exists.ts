import "server-only";

import { db } from "@/lib/db/knex";

export async function userExists(email: string): Promise<boolean> {
  return Boolean(await db("users").where({ email }).first("id"));
}
