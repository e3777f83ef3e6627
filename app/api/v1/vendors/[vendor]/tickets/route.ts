import { NextResponse } from "next/server";

import { createTicketSchema } from "@/content-schema/ticket-create";
import { requireMember } from "@/lib/auth/access";
import { listQueuePage } from "@/lib/desk/list-queue";
import { queueQuerySchema } from "@/lib/desk/queue-page";
import { parseInput } from "@/lib/errors/zod-field-errors";
import { readJson } from "@/lib/http/read-json";
import { withVendor } from "@/lib/http/with-vendor";
import { createTicket } from "@/lib/tickets/create-ticket";
import { listCustomerTickets } from "@/lib/tickets/list-customer-tickets";
import { supportRole } from "@/lib/tickets/member-kind";

// GET /api/v1/vendors/{vendor}/tickets: a customer's own tickets, or the Desk queue for staff (filters in the query).
export const GET = withVendor(async (request, { access }) => {
  const who = supportRole(access);
  if (who.kind === "customer")
    return NextResponse.json({ tickets: await listCustomerTickets({ vendorId: access.vendor.id, customerId: who.userId }) });
  // Unknown or malformed filters are dropped, never refused: a saved link keeps working.
  const { page = 1, ...filters } = queueQuerySchema.safeParse(Object.fromEntries(new URL(request.url).searchParams)).data ?? {};
  return NextResponse.json(await listQueuePage({ vendorId: access.vendor.id, userId: who.userId, filters, page }));
});

// POST /api/v1/vendors/{vendor}/tickets: open a ticket; repeating the idempotency key returns the same ticket (200, not 201).
export const POST = withVendor(
  async (request, { access }) => {
    requireMember(access);
    const input = parseInput(createTicketSchema, await readJson(request));
    const ticket = await createTicket({ vendor: access.vendor, customerId: access.user.id, input });
    return NextResponse.json({ ticket }, { status: ticket.created ? 201 : 200 });
  },
  { permission: "support.use", rateLimit: { limit: 30, windowSeconds: 60 } },
);
