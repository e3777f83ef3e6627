import "server-only";

import type { Knex } from "knex";

import type { Vendor } from "@/content-schema/vendor";
import { appUrl } from "@/lib/http/app-url";
import { replyAddress } from "@/lib/inbound-mail/reply-address";
import { filterWantsMail } from "@/lib/mail-preferences/mail-preferences";
import { mailFooter } from "@/lib/mail-preferences/preferences-link";
import { enqueueMail } from "@/lib/mail/enqueue-mail";

import { findTicketMailContext, supportTeam } from "./ticket-mail-context";

/** The support team hears about every new ticket (unless they turned ticket mail off); queued in the ticket's own transaction. */
export async function notifyNewTicket(trx: Knex.Transaction, { vendor, ticketId }: { vendor: Vendor; ticketId: string }): Promise<void> {
  const ctx = await findTicketMailContext(trx, vendor.id, ticketId);
  if (!ctx) return;
  const link = appUrl(`/${ctx.vendorSlug}/desk/tickets/${ticketId}`);
  const team = await filterWantsMail(trx, { vendorId: vendor.id, kind: "ticket_notifications", people: await supportTeam(trx, vendor.id) });
  for (const person of team) {
    await enqueueMail(
      trx,
      {
        to: person.email,
        subject: `[${ctx.vendorName} #${ctx.number}] New ticket: ${ctx.subject}`,
        text: `${ctx.customer.name || ctx.customer.email} opened ticket #${ctx.number}: ${ctx.subject}

Open it on the Desk: ${link}
${mailFooter(ctx.vendorSlug, ctx.vendorName, { vendorId: vendor.id, userId: person.id }).text}`,
        replyTo: replyAddress({ ticketId, userId: person.id }),
      },
      { key: `ticket-new:${ticketId}` },
    );
  }
}
