import "server-only";

import { db } from "@/lib/db/knex";

import type { Role } from "./roles";

export type Member = { id: string; vendorId: string; userId: string; role: Role };

export async function findMembership(vendorId: string, userId: string): Promise<Member | null> {
  const row = await db("members")
    .where({ vendor_id: vendorId, user_id: userId })
    .first<{ id: string; vendor_id: string; user_id: string; role: Role } | undefined>();
  return row ? { id: row.id, vendorId: row.vendor_id, userId: row.user_id, role: row.role } : null;
}
