import "server-only";

import { cache } from "react";

import { requirePageAccess } from "@/lib/auth/page-access";
import { db } from "@/lib/db/knex";
import { isUuid } from "@/lib/ids/is-uuid";

// Support and Desk page data: each lookup runs once per request, shared by a segment's layout (the 404,
// decided above the loading boundary) and its page. `find…` answers null for "not found here".

/** The signed-in customer's own ticket in this vendor. */
export const findCustomerTicket = cache(async (vendorSlug: string, ticketParam: string) => {
  const { vendor, user } = await requirePageAccess(vendorSlug, "support.use", `/${vendorSlug}/support`);
  if (!user || !isUuid(ticketParam)) return null;
  const row = await db("tickets").where({ id: ticketParam, vendor_id: vendor.id, customer_id: user.id }).first("id");
  return row ? { vendor, user, ticketId: row.id } : null;
});

/** A ticket of this vendor, for its staff. */
export const findDeskTicket = cache(async (vendorSlug: string, ticketParam: string) => {
  const { vendor, user } = await requirePageAccess(vendorSlug, "desk.use", `/${vendorSlug}/desk`);
  if (!isUuid(ticketParam)) return null;
  const row = await db("tickets").where({ id: ticketParam, vendor_id: vendor.id }).first("id");
  return row ? { vendor, user, ticketId: row.id } : null;
});
