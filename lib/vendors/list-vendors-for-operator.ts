import "server-only";

import { db } from "@/lib/db/knex";

// Operations needs counts, not the vendors' private rows.
export async function listVendorsForOperator() {
  const rows = await db("vendors as v")
    .leftJoin("members as m", "m.vendor_id", "v.id")
    .groupBy("v.id")
    .orderBy("v.name")
    .select("v.id", "v.slug", "v.name", "v.created_at")
    .count<{ id: string; slug: string; name: string; created_at: Date; n: string }[]>("m.id as n");
  return rows.map((r) => ({ id: r.id, slug: r.slug, name: r.name, createdAt: new Date(r.created_at), memberCount: Number(r.n) }));
}
