import "server-only";

import { db } from "@/lib/db/knex";

export type Option = { id: string; name: string };

/** Members a ticket can be assigned to (support staff and admins). */
export async function listAssignees({ vendorId }: { vendorId: string }): Promise<Option[]> {
  const rows = await db("members as m")
    .join("users as u", "u.id", "m.user_id")
    .where("m.vendor_id", vendorId)
    .whereIn("m.role", ["support", "admin"])
    .orderBy("u.name")
    .select("u.id", "u.name", "u.email");
  return rows.map((r) => ({ id: r.id, name: r.name || r.email }));
}

export async function listMaterialOptions({ vendorId }: { vendorId: string }): Promise<Option[]> {
  return db("materials").where({ vendor_id: vendorId }).orderBy("name").select<Option[]>("id", "name");
}
