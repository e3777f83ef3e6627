import { NextResponse } from "next/server";
import { z } from "zod";

import { ticketThreadQuerySchema } from "@/content-schema/api-queries";
import { NotFound } from "@/lib/errors/domain-errors";
import { withVendor } from "@/lib/http/with-vendor";
import { toCustomerThread } from "@/lib/tickets/customer-view";
import { getTicketThread } from "@/lib/tickets/get-ticket-thread";
import { supportRole } from "@/lib/tickets/member-kind";

// GET /api/v1/vendors/{vendor}/tickets/{id}: one ticket with its thread, folded to the latest messages unless
// ?messages=all (customers: their own, in the customer's view).
export const GET = withVendor<{ vendor: string; ticket: string }>(async (request, { access, params }) => {
  const ticketId = z.uuid().safeParse(params.ticket).data;
  if (!ticketId) throw new NotFound();
  const { messages } = ticketThreadQuerySchema.parse(Object.fromEntries(request.nextUrl.searchParams));
  const vendorId = access.vendor.id;
  const who = supportRole(access);
  if (who.kind === "customer") {
    return NextResponse.json(
      toCustomerThread(await getTicketThread({ vendorId, ticketId, messages, viewer: { kind: "customer", userId: who.userId } })),
    );
  }
  return NextResponse.json(await getTicketThread({ vendorId, ticketId, messages, viewer: { kind: "staff" } }));
});
