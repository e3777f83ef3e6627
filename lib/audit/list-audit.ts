import "server-only";

import { db } from "@/lib/db/knex";

export type AuditListItem = {
  id: string;
  action: string;
  details: Record<string, unknown>;
  objectType: string;
  createdAt: Date;
  actorEmail: string | null;
};

export async function listRecentAudit({ vendorId, limit = 20 }: { vendorId: string; limit?: number }): Promise<AuditListItem[]> {
  const rows = await db("audit_log as a")
    .leftJoin("users as u", "u.id", "a.actor_user_id")
    .where("a.vendor_id", vendorId)
    .orderBy("a.created_at", "desc")
    .limit(limit)
    .select("a.id", "a.action", "a.details", "a.object_type", "a.created_at", "u.email");
  return rows.map((r) => ({
    id: String(r.id),
    action: r.action,
    details: r.details ?? {},
    objectType: r.object_type,
    createdAt: new Date(r.created_at),
    actorEmail: r.email,
  }));
}
