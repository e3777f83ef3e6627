import "server-only";

import type { Knex } from "knex";

export type TicketMailContext = {
  ticketId: string;
  number: number;
  subject: string;
  vendorSlug: string;
  vendorName: string;
  customer: { id: string; email: string; name: string };
  assignee: { id: string; email: string; name: string } | null;
};

export { REPLY_ABOVE } from "./reply-mail";

/** Read inside the writing transaction, so a ticket or message not yet committed is seen. */
export async function findTicketMailContext(trx: Knex.Transaction, vendorId: string, ticketId: string): Promise<TicketMailContext | null> {
  const row = await trx("tickets as t")
    .join("vendors as v", "v.id", "t.vendor_id")
    .join("users as c", "c.id", "t.customer_id")
    .leftJoin("users as a", "a.id", "t.assignee_id")
    .where({ "t.id": ticketId, "t.vendor_id": vendorId })
    .first(
      "t.id",
      "t.number",
      "t.subject",
      "v.slug",
      "v.name as vendor_name",
      "c.id as c_id",
      "c.email",
      "c.name",
      "a.id as a_id",
      "a.email as a_email",
      "a.name as a_name",
    );
  if (!row) return null;
  return {
    ticketId: row.id,
    number: row.number,
    subject: row.subject,
    vendorSlug: row.slug,
    vendorName: row.vendor_name,
    customer: { id: row.c_id, email: row.email, name: row.name },
    assignee: row.a_id ? { id: row.a_id, email: row.a_email, name: row.a_name } : null,
  };
}

/** The vendor's support team (support staff; admins when there are none), each with the id their reply address is bound to. */
export async function supportTeam(trx: Knex.Transaction, vendorId: string): Promise<{ id: string; email: string }[]> {
  const rows = await trx("members as m")
    .join("users as u", "u.id", "m.user_id")
    .where("m.vendor_id", vendorId)
    .whereIn("m.role", ["support", "admin"])
    .select("u.id", "u.email", "m.role");
  const support = rows.filter((r) => r.role === "support");
  return (support.length ? support : rows).map((r) => ({ id: r.id as string, email: r.email as string }));
}
