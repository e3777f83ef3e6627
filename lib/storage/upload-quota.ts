import "server-only";

import type { Knex } from "knex";

import { db } from "@/lib/db/knex";
import { DomainError } from "@/lib/errors/domain-errors";

/** UPLOAD_QUOTA_MB: what one person may keep stored (ticket files and outcome photos, all vendors); 250 MB by default. */
export function uploadQuotaBytes(): number {
  const mb = Number(process.env.UPLOAD_QUOTA_MB ?? "250");
  return (Number.isFinite(mb) && mb > 0 ? mb : 250) * 1024 * 1024;
}

export class UploadQuotaExceeded extends DomainError {
  constructor(quotaBytes: number) {
    const mb = Math.round(quotaBytes / (1024 * 1024));
    super(
      "too_large",
      `Your files use up your ${mb} MB of upload space. Remove files you no longer need from your tickets, or ask the support team.`,
    );
  }
}

async function usedBytes(trx: Knex | Knex.Transaction, userId: string): Promise<number> {
  const { rows } = await trx.raw<{ rows: { used: string }[] }>(
    `select (select coalesce(sum(size_bytes), 0) from ticket_attachments where uploaded_by = ?)
          + (select coalesce(sum(photo_size_bytes), 0) from outcomes where user_id = ? and photo_key is not null) as used`,
    [userId, userId],
  );
  return Number(rows[0].used);
}

/**
 * Refuses an upload that would take the person past their quota. Inside a transaction it also takes a per-person
 * lock, so parallel uploads are checked one after another against the same total.
 */
export async function assertUploadQuota({
  userId,
  addBytes,
  trx = db,
}: {
  userId: string;
  addBytes: number;
  trx?: Knex | Knex.Transaction;
}): Promise<void> {
  if (trx !== db) await trx.raw("select pg_advisory_xact_lock(hashtext(?))", [`upload-quota:${userId}`]);
  const quota = uploadQuotaBytes();
  if ((await usedBytes(trx, userId)) + addBytes > quota) throw new UploadQuotaExceeded(quota);
}
