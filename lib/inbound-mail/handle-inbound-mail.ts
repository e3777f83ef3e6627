import "server-only";

import { createHash } from "node:crypto";

import { can } from "@/lib/auth/permissions";
import type { Role } from "@/lib/auth/roles";
import { isUniqueViolation } from "@/lib/catalogue/unique-violation";
import { db } from "@/lib/db/knex";
import { DomainError } from "@/lib/errors/domain-errors";
import { addCustomerMessage, addStaffMessage } from "@/lib/tickets/add-message";
import { saveAttachment } from "@/lib/tickets/attachments/save-attachment";

import { failedAuthentication, inboundAuthRequired, senderAuthenticated } from "./authentication-results";
import { verifyReplyAddress } from "./reply-address";
import { stripQuotedText } from "./strip-quoted";

export type InboundMail = {
  rcptTo: string[];
  from: string;
  text: string;
  attachments?: { fileName: string; content: Buffer }[];
  messageId?: string;
  /** Authentication-Results headers added by the receiving mail server. */
  authenticationResults?: string[];
};
export type InboundOutcome = {
  outcome: "accepted" | "duplicate" | "dropped";
  reason: string;
  ticketId?: string;
  messageId?: string;
  vendorId?: string;
};

async function log(entry: {
  vendorId?: string | null;
  ticketId?: string | null;
  from: string;
  to: string;
  outcome: string;
  reason: string;
}) {
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

type Recipient = { ticketId: string; vendorId: string; userId: string; email: string; asCustomer: boolean };

/** The person a reply address was mailed to, if they may still write on the ticket; else why not. */
async function currentRecipient(ticketId: string, userId: string): Promise<Recipient | string> {
  const row = await db("tickets as t")
    .join("users as u", db.raw("u.id = ?", [userId]))
    .leftJoin("members as m", (j) => j.on("m.vendor_id", "t.vendor_id").andOn("m.user_id", "u.id"))
    .where("t.id", ticketId)
    .first<{ vendor_id: string; customer_id: string; email: string; role: Role | null } | undefined>(
      "t.vendor_id",
      "t.customer_id",
      "u.email",
      "m.role",
    );
  if (!row) return "ticket or person no longer exists";
  if (!row.role) return "the person the address was sent to is no longer a member";
  if (row.customer_id === userId) return { ticketId, vendorId: row.vendor_id, userId, email: row.email, asCustomer: true };
  if (can(row.role, "desk.use")) return { ticketId, vendorId: row.vendor_id, userId, email: row.email, asCustomer: false };
  return "the person the address was sent to has no access to the ticket";
}

/** Message-ID, or a digest of sender and text when a mail has none, so a retried delivery is recognised. */
export function messageKeyOf(mail: InboundMail): string {
  const id = mail.messageId?.trim();
  return id ? id.slice(0, 300) : `sha256:${createHash("sha256").update(`${mail.from}\n${mail.text}`).digest("hex")}`;
}

const postedWithKey = async (ticketId: string, key: string) =>
  db("ticket_messages").where({ ticket_id: ticketId, email_message_key: key }).first<{ id: string } | undefined>("id");

/**
 * A reply is attributed only to the person its signed address was mailed to. A From that is not that person's
 * address is refused (a forwarded notification does not let its new reader post as the recipient), as is mail
 * whose receiving server recorded a failed SPF, DKIM or DMARC check, or (INBOUND_MAIL_REQUIRE_AUTH) did not
 * record a pass that vouches for the From domain.
 */
async function handleOne(to: string, mail: InboundMail): Promise<InboundOutcome> {
  const target = verifyReplyAddress(to);
  if (!target) return { outcome: "dropped", reason: "unsigned or forged reply address" };
  const failed = failedAuthentication(mail.authenticationResults ?? []);
  if (failed) return { outcome: "dropped", reason: `receiving server reports ${failed}`, ticketId: target.ticketId };
  if (inboundAuthRequired() && !senderAuthenticated(mail.authenticationResults ?? [], mail.from)) {
    return {
      outcome: "dropped",
      reason: "receiving server does not vouch for the From domain (no aligned DKIM or DMARC pass)",
      ticketId: target.ticketId,
    };
  }
  const recipient = await currentRecipient(target.ticketId, target.userId);
  if (typeof recipient === "string") return { outcome: "dropped", reason: recipient, ticketId: target.ticketId };
  const base = { vendorId: recipient.vendorId, ticketId: recipient.ticketId };
  if (mail.from.trim().toLowerCase() !== recipient.email.toLowerCase()) {
    return { ...base, outcome: "dropped", reason: "From is not the person the reply address was sent to" };
  }
  const body = stripQuotedText(mail.text);
  if (!body) return { ...base, outcome: "dropped", reason: "empty reply" };
  const emailMessageKey = messageKeyOf(mail);
  const seen = await postedWithKey(recipient.ticketId, emailMessageKey);
  if (seen) return { ...base, outcome: "duplicate", reason: "already posted (same Message-ID)", messageId: seen.id };
  const attachmentIds = await saveMailAttachments(recipient.vendorId, recipient.userId, mail);
  const message = { ...base, authorId: recipient.userId, body, source: "email" as const, attachmentIds, emailMessageKey };
  try {
    const { id } = recipient.asCustomer ? await addCustomerMessage(message) : await addStaffMessage({ ...message, visibility: "public" });
    return { ...base, outcome: "accepted", reason: recipient.asCustomer ? "customer reply" : "staff reply", messageId: id };
  } catch (error) {
    if (isUniqueViolation(error)) return { ...base, outcome: "duplicate", reason: "already posted (same Message-ID)" };
    // A step after the write failed (a notification, say): the reply is stored, so the delivery succeeded.
    const stored = await postedWithKey(recipient.ticketId, emailMessageKey).catch(() => undefined);
    if (stored) {
      console.error("[inbound-mail] reply stored, a later step failed", error);
      return { ...base, outcome: "accepted", reason: "stored; a later step failed", messageId: stored.id };
    }
    throw error;
  }
}

/** Thrown when nothing of the mail was stored, so the sending server should try again later (SMTP 451). */
export class InboundTemporaryFailure extends Error {}

/**
 * Turns a reply to a notification into a thread message; anything else is dropped and logged. Throws
 * InboundTemporaryFailure only while nothing of this mail was stored: once one recipient's reply is stored the
 * delivery has succeeded (answering 451 then would make the sender post it again), and later failures are logged.
 */
export async function handleInboundMail(mail: InboundMail): Promise<InboundOutcome[]> {
  const results: InboundOutcome[] = [];
  let stored = false;
  for (const to of mail.rcptTo) {
    let result: InboundOutcome;
    try {
      result = await handleOne(to, mail);
    } catch (error) {
      if (!stored) throw new InboundTemporaryFailure("temporary failure before anything was stored", { cause: error });
      console.error(`[inbound-mail] reply to ${to} failed after another recipient's reply was stored`, error);
      result = { outcome: "dropped", reason: "failed after another recipient's reply was stored" };
    }
    stored ||= result.outcome === "accepted" || result.outcome === "duplicate";
    try {
      const ticket = result.ticketId
        ? await db("tickets").where({ id: result.ticketId }).first<{ id: string; vendor_id: string } | undefined>("id", "vendor_id")
        : undefined;
      await log({
        vendorId: ticket?.vendor_id ?? null,
        ticketId: ticket?.id ?? null,
        from: mail.from,
        to,
        outcome: result.outcome,
        reason: result.reason,
      });
    } catch (error) {
      if (!stored) throw new InboundTemporaryFailure("could not log the inbound mail", { cause: error });
      console.error("[inbound-mail] could not log an inbound mail", error);
    }
    results.push(result);
  }
  return results;
}
