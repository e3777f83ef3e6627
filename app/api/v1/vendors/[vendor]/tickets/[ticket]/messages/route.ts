import { NextResponse } from "next/server";
import { z } from "zod";

import { ticketMessageSchema } from "@/content-schema/api-queries";
import { NotFound } from "@/lib/errors/domain-errors";
import { parseInput } from "@/lib/errors/zod-field-errors";
import { idempotencyKeyOf } from "@/lib/http/idempotency-key";
import { readJson } from "@/lib/http/read-json";
import { withVendor } from "@/lib/http/with-vendor";
import { addCustomerMessage } from "@/lib/tickets/add-message";

// POST /api/v1/vendors/{vendor}/tickets/{id}/messages: the customer adds to their own ticket (201; 200 for a repeated Idempotency-Key).
export const POST = withVendor<{ vendor: string; ticket: string }>(
  async (request, { access, params }) => {
    const ticketId = z.uuid().safeParse(params.ticket).data;
    if (!ticketId || !access.user) throw new NotFound();
    const { body } = parseInput(ticketMessageSchema, await readJson(request));
    const { created, ...message } = await addCustomerMessage({
      vendorId: access.vendor.id,
      ticketId,
      authorId: access.user.id,
      body,
      source: "api",
      idempotencyKey: idempotencyKeyOf(request),
    });
    return NextResponse.json({ message }, { status: created ? 201 : 200 });
  },
  { permission: "support.use", rateLimit: { limit: 60, windowSeconds: 60 } },
);
