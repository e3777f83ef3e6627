import "server-only";

import { db } from "@/lib/db/knex";

export type TicketHistoryEntry = {
  id: string;
  action: string;
  actorName: string | null;
  details: Record<string, unknown>;
  createdAt: string;
};

/** The audit trail of one ticket (who changed what, when), oldest first; staff only. */
export async function listTicketHistory({ vendorId, ticketId }: { vendorId: string; ticketId: string }): Promise<TicketHistoryEntry[]> {
  const rows = await db("audit_log as a")
    .leftJoin("users as u", "u.id", "a.actor_user_id")
    .where({ "a.vendor_id": vendorId, "a.object_type": "ticket", "a.object_id": ticketId })
    .orderBy("a.id")
    .select("a.id", "a.action", "a.details", "a.created_at", "u.name", "u.email");
  return rows.map((r) => ({
    id: String(r.id),
    action: r.action,
    actorName: r.name || r.email || null,
    details: r.details ?? {},
    createdAt: new Date(r.created_at).toISOString(),
  }));
}
