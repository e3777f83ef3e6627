import "server-only";

import type { Knex } from "knex";

import { writeAudit } from "@/lib/audit/write-audit";

export type TicketField = "status" | "priority" | "assignee" | "tags";

/** One audit entry per changed field: who, when (the row's time), from and to. */
export async function auditTicketChange(
  trx: Knex.Transaction,
  entry: { vendorId: string; actorUserId: string | null; ticketId: string; field: TicketField; from: unknown; to: unknown; via?: string },
): Promise<void> {
  await writeAudit(
    {
      vendorId: entry.vendorId,
      actorUserId: entry.actorUserId,
      action: `ticket.${entry.field}`,
      objectType: "ticket",
      objectId: entry.ticketId,
      details: { from: entry.from, to: entry.to, ...(entry.via ? { via: entry.via } : {}) },
    },
    trx,
  );
}
