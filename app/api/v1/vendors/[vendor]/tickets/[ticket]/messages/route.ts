import { NextResponse } from "next/server";
import { z } from "zod";

import { NotFound } from "@/lib/errors/domain-errors";
import { parseInput } from "@/lib/errors/zod-field-errors";
import { readJson } from "@/lib/http/read-json";
import { withVendor } from "@/lib/http/with-vendor";
import { addCustomerMessage } from "@/lib/tickets/add-message";

const bodySchema = z.object({ body: z.string().trim().min(1).max(20_000) });

// POST /api/v1/vendors/{vendor}/tickets/{id}/messages: the customer adds to their own ticket.
export const POST = withVendor<{ vendor: string; ticket: string }>(
  async (request, { access, params }) => {
    const ticketId = z.uuid().safeParse(params.ticket).data;
    if (!ticketId || !access.user) throw new NotFound();
    const { body } = parseInput(bodySchema, await readJson(request));
    const message = await addCustomerMessage({ vendorId: access.vendor.id, ticketId, authorId: access.user.id, body, source: "api" });
    return NextResponse.json({ message }, { status: 201 });
  },
  { permission: "support.use", rateLimit: { limit: 60, windowSeconds: 60 } },
);
