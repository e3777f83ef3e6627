import "server-only";

import type { Knex } from "knex";

import { db } from "@/lib/db/knex";

export type AuditEntry = {
  vendorId: string | null;
  actorUserId: string | null;
  action: string;
  objectType: string;
  objectId?: string | null;
  details?: Record<string, unknown>;
};

export async function writeAudit(entry: AuditEntry, trx: Knex | Knex.Transaction = db): Promise<void> {
  await trx("audit_log").insert({
    vendor_id: entry.vendorId,
    actor_user_id: entry.actorUserId,
    action: entry.action,
    object_type: entry.objectType,
    object_id: entry.objectId ?? null,
    details: JSON.stringify(entry.details ?? {}),
  });
}
