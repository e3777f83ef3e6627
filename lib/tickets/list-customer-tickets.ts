import "server-only";

import { db } from "@/lib/db/knex";

import { toCustomerTicket, type CustomerTicket } from "./customer-view";
import { selectTickets, toTicketDetail } from "./ticket-select";

/** A customer's own tickets in one vendor, newest activity first, in the customer's view. */
export async function listCustomerTickets({
  vendorId,
  customerId,
  limit = 200,
}: {
  vendorId: string;
  customerId: string;
  limit?: number;
}): Promise<CustomerTicket[]> {
  const rows = await selectTickets(db, vendorId).where("t.customer_id", customerId).orderBy("t.last_activity_at", "desc").limit(limit);
  return rows.map((row) => toCustomerTicket(toTicketDetail(row)));
}
