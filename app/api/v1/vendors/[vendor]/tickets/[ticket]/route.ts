import { NextResponse } from "next/server";
import { z } from "zod";

import { withVendor } from "@/lib/http/with-vendor";
import { NotFound } from "@/lib/errors/domain-errors";
import { getTicketThread } from "@/lib/tickets/get-ticket-thread";
import { supportRole } from "@/lib/tickets/member-kind";

// GET /api/v1/vendors/{vendor}/tickets/{id}: one ticket with its thread (customers: their own, without internal notes).
export const GET = withVendor<{ vendor: string; ticket: string }>(async (_request, { access, params }) => {
  const ticketId = z.uuid().safeParse(params.ticket).data;
  if (!ticketId) throw new NotFound();
  const who = supportRole(access);
  const viewer = who.kind === "customer" ? { kind: "customer" as const, userId: who.userId } : { kind: "staff" as const };
  return NextResponse.json(await getTicketThread({ vendorId: access.vendor.id, ticketId, viewer }));
});
