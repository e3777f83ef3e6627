import "server-only";

import { db } from "@/lib/db/knex";

export type Option = { id: string; name: string };

/** Materials of the vendor and the customer's own machines, for the new-ticket form. */
export async function listTicketFormOptions({
  vendorId,
  customerId,
}: {
  vendorId: string;
  customerId: string;
}): Promise<{ materials: Option[]; machines: Option[] }> {
  const [materials, machines] = await Promise.all([
    db("materials").where({ vendor_id: vendorId }).orderBy("name").select<Option[]>("id", "name"),
    db("machines").where({ vendor_id: vendorId, user_id: customerId }).orderBy("name").select<Option[]>("id", "name"),
  ]);
  return { materials, machines };
}
