import "server-only";

import type { Knex } from "knex";

import { db } from "@/lib/db/knex";

import { getStorage } from "./get-storage";

export const UPLOAD_CLEANUP_QUEUE = "uploads.cleanup";
export const UPLOAD_CLEANUP_CRON = "17 * * * *";
/** Files uploaded for a ticket or reply that was never sent are kept this long. */
export const UNATTACHED_HOURS = 24;

/** Marks stored files for deletion, in the caller's transaction (the one that removes what owned them). */
export async function queueUploadDeletions(trx: Knex | Knex.Transaction, keys: (string | null)[]): Promise<void> {
  const rows = keys.filter((k): k is string => Boolean(k)).map((storage_key) => ({ storage_key }));
  if (rows.length) await trx("upload_deletions").insert(rows).onConflict("storage_key").ignore();
}

/** Deletes marked files from storage; a file that fails stays marked for the next run. */
export async function drainUploadDeletions({ keys, limit = 500 }: { keys?: string[]; limit?: number } = {}): Promise<number> {
  const query = db("upload_deletions").orderBy("created_at").limit(limit);
  const rows: { storage_key: string }[] = await (keys ? query.whereIn("storage_key", keys) : query).select("storage_key");
  let deleted = 0;
  for (const { storage_key } of rows) {
    try {
      await getStorage().delete(storage_key);
      await db("upload_deletions").where({ storage_key }).delete();
      deleted++;
    } catch (error) {
      console.warn(`[uploads] could not delete ${storage_key}; will retry`, error);
    }
  }
  return deleted;
}

/** The scheduled job: drops ticket files never attached within a day, then deletes every marked file. */
export async function cleanupUploads(): Promise<{ unattached: number; deleted: number }> {
  const unattached = await db.transaction(async (trx) => {
    const gone: { storage_key: string }[] = await trx("ticket_attachments")
      .whereNull("ticket_id")
      .where("created_at", "<", trx.raw(`now() - interval '${UNATTACHED_HOURS} hours'`))
      .delete()
      .returning("storage_key");
    await queueUploadDeletions(
      trx,
      gone.map((g) => g.storage_key),
    );
    return gone.length;
  });
  return { unattached, deleted: await drainUploadDeletions() };
}

export async function cleanupUploadsJob(): Promise<void> {
  const { unattached, deleted } = await cleanupUploads();
  if (unattached || deleted) console.info(`[uploads] removed ${unattached} unattached uploads, deleted ${deleted} stored files`);
}
