import "server-only";

import { db } from "./knex";

/** Whether the database answers a trivial query within a couple of seconds. */
export async function databaseState(): Promise<"up" | "down"> {
  try {
    await Promise.race([db.raw("select 1"), new Promise((_, reject) => setTimeout(() => reject(new Error("timeout")), 2_000))]);
    return "up";
  } catch {
    return "down";
  }
}
