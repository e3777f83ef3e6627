import "server-only";

import type { Role } from "@/lib/auth/roles";
import { db } from "@/lib/db/knex";

export type MemberRow = { id: string; userId: string; email: string; name: string; role: Role; createdAt: Date };
export type PendingInvitation = { id: string; email: string; role: Role; expiresAt: Date; createdAt: Date };

export async function listMembers({ vendorId }: { vendorId: string }): Promise<MemberRow[]> {
  const rows = await db("members as m")
    .join("users as u", "u.id", "m.user_id")
    .where("m.vendor_id", vendorId)
    .orderBy([{ column: "m.role" }, { column: "u.name" }])
    .select("m.id", "m.user_id", "u.email", "u.name", "m.role", "m.created_at");
  return rows.map((r) => ({ id: r.id, userId: r.user_id, email: r.email, name: r.name, role: r.role, createdAt: r.created_at }));
}

export async function listPendingInvitations({ vendorId }: { vendorId: string }): Promise<PendingInvitation[]> {
  const rows = await db("invitations")
    .where({ vendor_id: vendorId })
    .whereNull("accepted_at")
    .whereNull("revoked_at")
    .where("expires_at", ">", db.fn.now())
    .orderBy("created_at", "desc")
    .select("id", "email", "role", "expires_at", "created_at");
  return rows.map((r) => ({ id: r.id, email: r.email, role: r.role, expiresAt: r.expires_at, createdAt: r.created_at }));
}
