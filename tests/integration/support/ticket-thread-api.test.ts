import { NextRequest } from "next/server";
import { describe, expect, it } from "vitest";

import { GET } from "@/app/api/v1/vendors/[vendor]/tickets/[ticket]/route";
import { LATEST_THREAD_MESSAGES } from "@/content-schema/api-queries";
import { createApiToken } from "@/tests/factories/api-tokens";
import { createVendorWithStaff } from "@/tests/factories/foundation";
import { insertThreadMessages, openTicket } from "@/tests/factories/tickets";

const LONG = LATEST_THREAD_MESSAGES + 12;

async function fetchThread(slug: string, token: string, id: string, query = "") {
  const response = await GET(
    new NextRequest(`http://localhost/api/v1/vendors/${slug}/tickets/${id}${query}`, { headers: { authorization: `Bearer ${token}` } }),
    { params: Promise.resolve({ vendor: slug, ticket: id }) },
  );
  expect(response.status).toBe(200);
  const body: { messages: { body: string }[]; earlierCount: number } = await response.json();
  return body;
}

// The Desk polls this answer every few seconds, so a long thread must come folded unless all of it is asked for.
describe("GET one ticket's thread", () => {
  it("folds a long thread by default, gives all with messages=all, and takes an unknown value as the default", async () => {
    const { vendor, customer, support } = await createVendorWithStaff();
    const ticket = await openTicket(vendor.id, customer.user.id);
    const ids = { vendorId: vendor.id, ticketId: ticket.id, customerId: customer.user.id, supportId: support.user.id };
    await insertThreadMessages(ids, LONG);
    for (const userId of [support.user.id, customer.user.id]) {
      const token = await createApiToken(vendor.id, userId);
      const folded = await fetchThread(vendor.slug, token, ticket.id);
      expect(folded.messages).toHaveLength(LATEST_THREAD_MESSAGES);
      expect(folded.messages.at(-1)?.body).toBe(`Message ${LONG}`);
      expect(folded.earlierCount).toBe(LONG - LATEST_THREAD_MESSAGES);
      const all = await fetchThread(vendor.slug, token, ticket.id, "?messages=all");
      expect(all.messages).toHaveLength(LONG);
      expect(all.earlierCount).toBe(0);
      for (const odd of ["?messages=ALL", "?messages=all&messages=latest", "?messages=%00"]) {
        expect((await fetchThread(vendor.slug, token, ticket.id, odd)).earlierCount).toBe(LONG - LATEST_THREAD_MESSAGES);
      }
    }
  });
});
