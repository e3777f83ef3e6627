import "server-only";

import type { Knex } from "knex";

import type { TicketCard } from "@/content-schema/ticket-card";
import type { MessageVisibility, TicketStatus } from "@/content-schema/ticket-status";
import { db } from "@/lib/db/knex";
import { NotFound } from "@/lib/errors/domain-errors";
import { queueTicketAnswered } from "@/lib/webhooks/queue-domain-events";

import { auditTicketChange } from "./audit-change";
import { notifyCustomerOfReply, notifyStaffOfCustomerReply } from "./notify/notify-reply";

type Source = "web" | "email" | "api";
type Base = {
  vendorId: string;
  ticketId: string;
  authorId: string;
  body: string;
  source?: Source;
  attachmentIds?: string[];
  /** A resubmitted message with the same key returns the first one instead of posting twice. */
  idempotencyKey?: string;
  /** The Message-ID of a reply by e-mail; unique per ticket, so a retried delivery posts once. */
  emailMessageKey?: string;
};
type Added = { id: string; created: boolean };

/** The message this author already posted with this key, if any (the caller holds the ticket's row lock). */
async function alreadyPosted(trx: Knex.Transaction, o: Base): Promise<string | null> {
  if (!o.idempotencyKey) return null;
  const row = await trx("ticket_messages")
    .where({ vendor_id: o.vendorId, author_id: o.authorId, idempotency_key: o.idempotencyKey })
    .first<{ id: string } | undefined>("id");
  return row?.id ?? null;
}

async function insertMessage(
  trx: Knex.Transaction,
  o: Base & { visibility: MessageVisibility; card?: TicketCard | null },
): Promise<string> {
  const [{ id }] = await trx("ticket_messages")
    .insert({
      vendor_id: o.vendorId,
      ticket_id: o.ticketId,
      author_id: o.authorId,
      visibility: o.visibility,
      source: o.source ?? "web",
      body: o.body,
      idempotency_key: o.idempotencyKey ?? null,
      card: o.card ? JSON.stringify(o.card) : null,
      email_message_key: o.emailMessageKey ?? null,
    })
    .returning<{ id: string }[]>("id");
  if (o.attachmentIds?.length) {
    await trx("ticket_attachments")
      .where({ vendor_id: o.vendorId, uploaded_by: o.authorId })
      .whereNull("ticket_id")
      .whereIn("id", o.attachmentIds)
      .update({ ticket_id: o.ticketId, message_id: id });
  }
  return id;
}

async function authorName(trx: Knex.Transaction, userId: string): Promise<string> {
  const u = await trx("users").where({ id: userId }).first<{ name: string; email: string }>("name", "email");
  return u?.name || u?.email || "Someone";
}

/** A customer adds to their own ticket; an answered, waiting or closed ticket goes back to "In progress". */
export async function addCustomerMessage(o: Base): Promise<Added> {
  return db.transaction(async (trx) => {
    // Row lock: concurrent messages queue up here and all land; status changes stay consistent.
    const ticket = await trx("tickets")
      .where({ id: o.ticketId, vendor_id: o.vendorId, customer_id: o.authorId })
      .forUpdate()
      .first<{ status: TicketStatus } | undefined>("status");
    if (!ticket) throw new NotFound();
    const earlier = await alreadyPosted(trx, o);
    if (earlier) return { id: earlier, created: false };
    const messageId = await insertMessage(trx, { ...o, visibility: "public" });
    const reopen = ticket.status === "answered" || ticket.status === "waiting_on_customer" || ticket.status === "closed";
    await trx("tickets")
      .where({ id: o.ticketId, vendor_id: o.vendorId })
      .update({ last_activity_at: trx.fn.now(), updated_at: trx.fn.now(), ...(reopen ? { status: "in_progress", closed_at: null } : {}) });
    if (reopen)
      await auditTicketChange(trx, {
        vendorId: o.vendorId,
        actorUserId: o.authorId,
        ticketId: o.ticketId,
        field: "status",
        from: ticket.status,
        to: "in_progress",
        via: "customer reply",
      });
    await notifyStaffOfCustomerReply(trx, {
      vendorId: o.vendorId,
      ticketId: o.ticketId,
      messageId,
      authorName: await authorName(trx, o.authorId),
      body: o.body,
      hasCard: false,
    });
    return { id: messageId, created: true };
  });
}

/** A staff reply (public, the first one stops the response clock; sets "Answered") or an internal note. */
export async function addStaffMessage(
  o: Base & { visibility: MessageVisibility; card?: TicketCard | null; machineId?: string },
): Promise<Added> {
  return db.transaction(async (trx) => {
    const ticket = await trx("tickets")
      .where({ id: o.ticketId, vendor_id: o.vendorId })
      .forUpdate()
      .first<{ status: TicketStatus; first_response_at: Date | null } | undefined>("status", "first_response_at");
    if (!ticket) throw new NotFound();
    const earlier = await alreadyPosted(trx, o);
    if (earlier) return { id: earlier, created: false };
    const messageId = await insertMessage(trx, o);
    if (o.card) {
      await trx("ticket_sheet_links")
        .insert({ vendor_id: o.vendorId, ticket_id: o.ticketId, sheet_version_id: o.card.sheetVersionId, machine_id: o.card.machine.id })
        .onConflict(["ticket_id", "sheet_version_id"])
        .ignore();
    }
    const patch: Record<string, unknown> = { last_activity_at: trx.fn.now(), updated_at: trx.fn.now() };
    if (o.visibility === "public") {
      if (!ticket.first_response_at) patch.first_response_at = trx.fn.now();
      if (ticket.status !== "answered" && ticket.status !== "closed") {
        patch.status = "answered";
        await auditTicketChange(trx, {
          vendorId: o.vendorId,
          actorUserId: o.authorId,
          ticketId: o.ticketId,
          field: "status",
          from: ticket.status,
          to: "answered",
          via: "staff reply",
        });
      }
    }
    await trx("tickets").where({ id: o.ticketId, vendor_id: o.vendorId }).update(patch);
    if (o.visibility === "public") {
      await notifyCustomerOfReply(trx, {
        vendorId: o.vendorId,
        ticketId: o.ticketId,
        messageId,
        authorName: await authorName(trx, o.authorId),
        body: o.body,
        hasCard: Boolean(o.card),
      });
      await queueTicketAnswered(trx, { vendorId: o.vendorId, ticketId: o.ticketId, messageId });
    }
    return { id: messageId, created: true };
  });
}
