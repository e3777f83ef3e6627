import "server-only";

import type { TicketRatingInput } from "@/content-schema/ticket-update";
import { writeAudit } from "@/lib/audit/write-audit";
import { db } from "@/lib/db/knex";
import { Conflict, NotFound } from "@/lib/errors/domain-errors";

/** The customer rates a closed ticket 1–5 with an optional comment (a later rating replaces it). */
export async function rateTicket({
  vendorId,
  customerId,
  input,
}: {
  vendorId: string;
  customerId: string;
  input: TicketRatingInput;
}): Promise<void> {
  await db.transaction(async (trx) => {
    const row = await trx("tickets")
      .where({ id: input.ticketId, vendor_id: vendorId, customer_id: customerId })
      .forUpdate()
      .first<{ status: string } | undefined>("status");
    if (!row) throw new NotFound();
    if (row.status !== "closed") throw new Conflict("A ticket can be rated once it is closed.");
    await trx("tickets")
      .where({ id: input.ticketId, vendor_id: vendorId })
      .update({ satisfaction: input.satisfaction, satisfaction_comment: input.comment || null, updated_at: trx.fn.now() });
    await writeAudit(
      {
        vendorId,
        actorUserId: customerId,
        action: "ticket.rating",
        objectType: "ticket",
        objectId: input.ticketId,
        details: { satisfaction: input.satisfaction },
      },
      trx,
    );
  });
}
