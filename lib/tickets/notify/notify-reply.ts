import "server-only";

import type { Knex } from "knex";

import { appUrl } from "@/lib/http/app-url";
import { replyAddress } from "@/lib/inbound-mail/reply-address";
import { filterWantsMail, wantsMail } from "@/lib/mail-preferences/mail-preferences";
import { mailFooter, withFooter } from "@/lib/mail-preferences/preferences-link";
import { enqueueMail } from "@/lib/mail/enqueue-mail";

import { renderReplyMail } from "./reply-mail";
import { findTicketMailContext, supportTeam } from "./ticket-mail-context";

type Options = { vendorId: string; ticketId: string; messageId: string; authorName: string; body: string; hasCard: boolean };

/** A staff reply (never a note) goes to the customer, with a signed Reply-To for answering by mail. */
export async function notifyCustomerOfReply(
  trx: Knex.Transaction,
  { vendorId, ticketId, messageId, authorName, body, hasCard }: Options,
): Promise<void> {
  const ctx = await findTicketMailContext(trx, vendorId, ticketId);
  if (!ctx || !(await wantsMail(trx, { vendorId, userId: ctx.customer.id, kind: "ticket_notifications" }))) return;
  const link = appUrl(`/${ctx.vendorSlug}/support/tickets/${ticketId}`);
  const note = hasCard ? "The reply includes a sheet adapted to your machine: open the ticket to see it." : undefined;
  await enqueueMail(
    trx,
    {
      to: ctx.customer.email,
      subject: `[${ctx.vendorName} #${ctx.number}] ${ctx.subject}`,
      ...withFooter(
        renderReplyMail({
          intro: `${authorName} replied to your ticket #${ctx.number}:`,
          body,
          note,
          linkLabel: "See the whole thread",
          link,
        }),
        mailFooter(ctx.vendorSlug, ctx.vendorName, { vendorId, userId: ctx.customer.id }),
      ),
      replyTo: replyAddress({ ticketId, userId: ctx.customer.id }),
    },
    { key: `message:${messageId}` },
  );
}

/** A customer reply goes to the assignee, or to the support team when nobody is assigned. */
export async function notifyStaffOfCustomerReply(
  trx: Knex.Transaction,
  { vendorId, ticketId, messageId, authorName, body }: Options,
): Promise<void> {
  const ctx = await findTicketMailContext(trx, vendorId, ticketId);
  if (!ctx) return;
  const link = appUrl(`/${ctx.vendorSlug}/desk/tickets/${ticketId}`);
  const recipients = await filterWantsMail(trx, {
    vendorId,
    kind: "ticket_notifications",
    people: ctx.assignee ? [ctx.assignee] : await supportTeam(trx, vendorId),
  });
  for (const person of recipients) {
    await enqueueMail(
      trx,
      {
        to: person.email,
        subject: `[${ctx.vendorName} #${ctx.number}] Customer reply: ${ctx.subject}`,
        ...withFooter(
          renderReplyMail({ intro: `${authorName} wrote on ticket #${ctx.number}:`, body, linkLabel: "Open it on the Desk", link }),
          mailFooter(ctx.vendorSlug, ctx.vendorName, { vendorId, userId: person.id }),
        ),
        replyTo: replyAddress({ ticketId, userId: person.id }),
      },
      { key: `message:${messageId}` },
    );
  }
}
