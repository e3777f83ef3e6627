import "server-only";

import { appUrl } from "@/lib/http/app-url";
import { replyAddress } from "@/lib/inbound-mail/reply-address";
import { enqueueMail } from "@/lib/mail/enqueue-mail";
import type { Vendor } from "@/lib/vendors/vendor-schema";

import { loadTicketMailContext, supportTeam } from "./ticket-mail-context";

/** The support team hears about every new ticket. */
export async function notifyNewTicket({ vendor, ticketId }: { vendor: Vendor; ticketId: string }): Promise<void> {
  const ctx = await loadTicketMailContext(vendor.id, ticketId);
  if (!ctx) return;
  const link = appUrl(`/${ctx.vendorSlug}/desk/tickets/${ticketId}`);
  for (const person of await supportTeam(vendor.id)) {
    await enqueueMail({
      to: person.email,
      subject: `[${ctx.vendorName} #${ctx.number}] New ticket: ${ctx.subject}`,
      text: `${ctx.customer.name || ctx.customer.email} opened ticket #${ctx.number}: ${ctx.subject}\n\nOpen it on the Desk: ${link}\n`,
      replyTo: replyAddress({ ticketId, userId: person.id }),
    });
  }
}
