import "server-only";

import { db } from "@/lib/db/knex";
import { DomainError } from "@/lib/errors/domain-errors";
import { addCustomerMessage, addStaffMessage } from "@/lib/tickets/add-message";
import { saveAttachment } from "@/lib/tickets/attachments/save-attachment";

import { verifyReplyAddress } from "./reply-address";
import { stripQuotedText } from "./strip-quoted";

export type InboundMail = { rcptTo: string[]; from: string; text: string; attachments?: { fileName: string; content: Buffer }[] };
export type InboundOutcome = { outcome: "accepted" | "dropped"; reason: string; ticketId?: string; messageId?: string };

async function log(entry: { vendorId?: string | null; ticketId?: string | null; from: string; to: string; outcome: string; reason: string }) {
  await db("inbound_mail_log").insert({
    vendor_id: entry.vendorId ?? null,
    ticket_id: entry.ticketId ?? null,
    mail_from: entry.from.slice(0, 320),
    rcpt_to: entry.to.slice(0, 320),
    outcome: entry.outcome,
    reason: entry.reason,
  });
  if (entry.outcome === "dropped") console.warn(`[inbound-mail] dropped mail from ${entry.from} to ${entry.to}: ${entry.reason}`);
}

/** Files sent with a reply are checked like uploads; ones that are refused are skipped, not fatal. */
async function saveMailAttachments(vendorId: string, userId: string, mail: InboundMail): Promise<string[]> {
  const ids: string[] = [];
  for (const file of (mail.attachments ?? []).slice(0, 10)) {
    try {
      ids.push((await saveAttachment({ vendorId, userId, bytes: file.content, fileName: file.fileName })).id);
    } catch (error) {
      if (!(error instanceof DomainError)) throw error;
      console.warn(`[inbound-mail] skipped attachment ${file.fileName}: ${error.message}`);
    }
  }
  return ids;
}

async function handleOne(to: string, mail: InboundMail): Promise<InboundOutcome> {
  const ticketId = verifyReplyAddress(to);
  if (!ticketId) return { outcome: "dropped", reason: "unsigned or forged reply address" };
  const ticket = await db("tickets as t")
    .join("users as c", "c.id", "t.customer_id")
    .where("t.id", ticketId)
    .first<{ id: string; vendor_id: string; customer_id: string; email: string } | undefined>("t.id", "t.vendor_id", "t.customer_id", "c.email");
  if (!ticket) return { outcome: "dropped", reason: "ticket no longer exists" };
  const body = stripQuotedText(mail.text);
  const sender = mail.from.trim().toLowerCase();
  const base = { vendorId: ticket.vendor_id, ticketId: ticket.id };
  if (!body) return { ...base, outcome: "dropped", reason: "empty reply" } as InboundOutcome;
  if (sender === ticket.email.toLowerCase()) {
    const attachmentIds = await saveMailAttachments(ticket.vendor_id, ticket.customer_id, mail);
    const { id } = await addCustomerMessage({ ...base, authorId: ticket.customer_id, body, source: "email", attachmentIds });
    return { outcome: "accepted", reason: "customer reply", ticketId: ticket.id, messageId: id };
  }
  const staff = await db("members as m")
    .join("users as u", "u.id", "m.user_id")
    .where({ "m.vendor_id": ticket.vendor_id })
    .whereIn("m.role", ["support", "admin"])
    .whereRaw("u.email = ?::citext", [sender])
    .first<{ id: string } | undefined>("u.id");
  if (!staff) return { outcome: "dropped", reason: "sender is not a participant of the ticket", ticketId: ticket.id };
  const attachmentIds = await saveMailAttachments(ticket.vendor_id, staff.id, mail);
  const { id } = await addStaffMessage({ ...base, authorId: staff.id, body, visibility: "public", source: "email", attachmentIds });
  return { outcome: "accepted", reason: "staff reply", ticketId: ticket.id, messageId: id };
}

/** Turns a reply to a notification into a thread message; anything else is dropped and logged. */
export async function handleInboundMail(mail: InboundMail): Promise<InboundOutcome[]> {
  const results: InboundOutcome[] = [];
  for (const to of mail.rcptTo) {
    const result = await handleOne(to, mail);
    const vendorId = result.ticketId ? ((await db("tickets").where({ id: result.ticketId }).first("vendor_id"))?.vendor_id ?? null) : null;
    await log({ vendorId, ticketId: result.ticketId, from: mail.from, to, outcome: result.outcome, reason: result.reason });
    results.push(result);
  }
  return results;
}
