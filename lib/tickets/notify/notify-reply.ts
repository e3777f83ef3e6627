import "server-only";

import { appUrl } from "@/lib/http/app-url";
import { replyAddress } from "@/lib/inbound-mail/reply-address";
import { enqueueMail } from "@/lib/mail/enqueue-mail";

import { loadTicketMailContext, REPLY_ABOVE, supportTeam } from "./ticket-mail-context";

type Options = { vendorId: string; ticketId: string; authorName: string; body: string; hasCard: boolean };

/** A staff reply (never a note) goes to the customer, with a signed Reply-To for answering by mail. */
export async function notifyCustomerOfReply({ vendorId, ticketId, authorName, body, hasCard }: Options): Promise<void> {
  const ctx = await loadTicketMailContext(vendorId, ticketId);
  if (!ctx) return;
  const link = appUrl(`/${ctx.vendorSlug}/support/tickets/${ticketId}`);
  const card = hasCard ? "\nThe reply includes a sheet adapted to your machine: open the ticket to see it.\n" : "";
  await enqueueMail({
    to: ctx.customer.email,
    subject: `[${ctx.vendorName} #${ctx.number}] ${ctx.subject}`,
    text: `${REPLY_ABOVE}\n\n${authorName} replied to your ticket #${ctx.number}:\n\n${body}\n${card}\nSee the whole thread: ${link}\n`,
    replyTo: replyAddress({ ticketId, userId: ctx.customer.id }),
  });
}

/** A customer reply goes to the assignee, or to the support team when nobody is assigned. */
export async function notifyStaffOfCustomerReply({ vendorId, ticketId, authorName, body }: Options): Promise<void> {
  const ctx = await loadTicketMailContext(vendorId, ticketId);
  if (!ctx) return;
  const link = appUrl(`/${ctx.vendorSlug}/desk/tickets/${ticketId}`);
  const recipients = ctx.assignee ? [ctx.assignee] : await supportTeam(vendorId);
  for (const person of recipients) {
    await enqueueMail({
      to: person.email,
      subject: `[${ctx.vendorName} #${ctx.number}] Customer reply: ${ctx.subject}`,
      text: `${REPLY_ABOVE}\n\n${authorName} wrote on ticket #${ctx.number}:\n\n${body}\n\nOpen it on the Desk: ${link}\n`,
      replyTo: replyAddress({ ticketId, userId: person.id }),
    });
  }
}
