import "server-only";

import type { Knex } from "knex";

import { appUrl } from "@/lib/http/app-url";
import { replyAddress } from "@/lib/inbound-mail/reply-address";
import { enqueueMail } from "@/lib/mail/enqueue-mail";

import { loadTicketMailContext, REPLY_ABOVE, supportTeamEmails } from "./ticket-mail-context";

type Options = { vendorId: string; ticketId: string; messageId: string; authorName: string; body: string; hasCard: boolean };

/** A staff reply (never a note) goes to the customer, with a signed Reply-To for answering by mail. */
export async function notifyCustomerOfReply(trx: Knex.Transaction, { vendorId, ticketId, messageId, authorName, body, hasCard }: Options): Promise<void> {
  const ctx = await loadTicketMailContext(trx, vendorId, ticketId);
  if (!ctx) return;
  const link = appUrl(`/${ctx.vendorSlug}/support/tickets/${ticketId}`);
  const card = hasCard ? "\nThe reply includes a sheet adapted to your machine: open the ticket to see it.\n" : "";
  await enqueueMail(
    trx,
    {
      to: ctx.customer.email,
      subject: `[${ctx.vendorName} #${ctx.number}] ${ctx.subject}`,
      text: `${REPLY_ABOVE}\n\n${authorName} replied to your ticket #${ctx.number}:\n\n${body}\n${card}\nSee the whole thread: ${link}\n`,
      replyTo: replyAddress(ticketId),
    },
    { key: `message:${messageId}` },
  );
}

/** A customer reply goes to the assignee, or to the support team when nobody is assigned. */
export async function notifyStaffOfCustomerReply(trx: Knex.Transaction, { vendorId, ticketId, messageId, authorName, body }: Options): Promise<void> {
  const ctx = await loadTicketMailContext(trx, vendorId, ticketId);
  if (!ctx) return;
  const link = appUrl(`/${ctx.vendorSlug}/desk/tickets/${ticketId}`);
  const recipients = ctx.assignee ? [ctx.assignee.email] : await supportTeamEmails(trx, vendorId);
  for (const to of recipients) {
    await enqueueMail(
      trx,
      {
        to,
        subject: `[${ctx.vendorName} #${ctx.number}] Customer reply: ${ctx.subject}`,
        text: `${REPLY_ABOVE}\n\n${authorName} wrote on ticket #${ctx.number}:\n\n${body}\n\nOpen it on the Desk: ${link}\n`,
        replyTo: replyAddress(ticketId),
      },
      { key: `message:${messageId}` },
    );
  }
}
