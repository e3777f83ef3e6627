import "server-only";

import type { CreateTicketInput } from "@/content-schema/ticket-create";
import type { Vendor } from "@/content-schema/vendor";
import { writeAudit } from "@/lib/audit/write-audit";
import { db } from "@/lib/db/knex";
import { appUrl } from "@/lib/http/app-url";
import { queueWebhookEvent } from "@/lib/webhooks/queue-webhook-event";

import { firstResponseDueAt } from "./first-response-due";
import { notifyNewTicket } from "./notify/notify-new-ticket";
import { resolveTicketLinks } from "./resolve-ticket-links";

type Options = { vendor: Vendor; customerId: string; input: CreateTicketInput };

/**
 * Opens a ticket. Idempotent per (vendor, customer, idempotency key): a repeated submit returns
 * the ticket the first one made, and `created: false`.
 */
export async function createTicket({ vendor, customerId, input }: Options): Promise<{ id: string; number: number; created: boolean }> {
  const result = await db.transaction(async (trx) => {
    // Serialises numbering per vendor; also orders two submits with the same key.
    await trx.raw("select pg_advisory_xact_lock(hashtextextended(?, 7))", [vendor.id]);
    const existing = await trx("tickets")
      .where({ vendor_id: vendor.id, customer_id: customerId, idempotency_key: input.idempotencyKey })
      .first<{ id: string; number: number } | undefined>("id", "number");
    if (existing) return { ...existing, created: false };

    const links = await resolveTicketLinks(trx, vendor.id, customerId, input);
    const now = new Date();
    const { next } = await trx("tickets")
      .where({ vendor_id: vendor.id })
      .first<{ next: number }>(trx.raw("coalesce(max(number), 0) + 1 as next"));
    const [row] = await trx("tickets")
      .insert({
        vendor_id: vendor.id,
        number: next,
        customer_id: customerId,
        subject: input.subject,
        body: input.body,
        material_id: input.materialId ?? links.sheetMaterialId ?? null,
        machine_id: input.machineId ?? null,
        idempotency_key: input.idempotencyKey,
        first_response_due_at: firstResponseDueAt(now, "normal", vendor.settings),
        created_at: now,
        updated_at: now,
        last_activity_at: now,
      })
      .returning<{ id: string; number: number }[]>(["id", "number"]);
    if (input.sheetVersionId) {
      await trx("ticket_sheet_links").insert({
        vendor_id: vendor.id,
        ticket_id: row.id,
        sheet_version_id: input.sheetVersionId,
        machine_id: input.machineId ?? null,
      });
    }
    if (input.attachmentIds.length) {
      await trx("ticket_attachments")
        .where({ vendor_id: vendor.id, uploaded_by: customerId })
        .whereNull("ticket_id")
        .whereIn("id", input.attachmentIds)
        .update({ ticket_id: row.id });
    }
    await writeAudit(
      {
        vendorId: vendor.id,
        actorUserId: customerId,
        action: "ticket.create",
        objectType: "ticket",
        objectId: row.id,
        details: { number: row.number },
      },
      trx,
    );
    await notifyNewTicket(trx, { vendor, ticketId: row.id });
    await queueWebhookEvent(trx, {
      vendorId: vendor.id,
      type: "ticket.created",
      data: { ticketId: row.id, number: row.number, subject: input.subject, url: appUrl(`/${vendor.slug}/desk/tickets/${row.id}`) },
    });
    return { ...row, created: true };
  });
  return result;
}
