import "server-only";

import { writeAudit } from "@/lib/audit/write-audit";
import type { Role } from "@/lib/auth/roles";
import { db } from "@/lib/db/knex";
import { Conflict, NotFound } from "@/lib/errors/domain-errors";
import { endSessions } from "@/lib/users/end-sessions";

async function assertAnotherAdminRemains(trx: typeof db, vendorId: string, memberId: string) {
  const others = await trx("members")
    .where({ vendor_id: vendorId, role: "admin" })
    .whereNot({ id: memberId })
    .count<{ count: string }[]>("id as count");
  if (Number(others[0].count) === 0) throw new Conflict("A workspace needs at least one admin.");
}

export async function changeMemberRole(opts: { vendorId: string; actorUserId: string; memberId: string; role: Role }) {
  await db.transaction(async (trx) => {
    const member = await trx("members")
      .where({ id: opts.memberId, vendor_id: opts.vendorId })
      .forUpdate()
      .first<{ role: Role } | undefined>("role");
    if (!member) throw new NotFound();
    if (member.role === opts.role) return;
    if (member.role === "admin") await assertAnotherAdminRemains(trx as unknown as typeof db, opts.vendorId, opts.memberId);
    await trx("members").where({ id: opts.memberId, vendor_id: opts.vendorId }).update({ role: opts.role, updated_at: trx.fn.now() });
    await writeAudit(
      {
        vendorId: opts.vendorId,
        actorUserId: opts.actorUserId,
        action: "member.role",
        objectType: "member",
        objectId: opts.memberId,
        details: { from: member.role, to: opts.role },
      },
      trx,
    );
  });
}

export async function removeMember(opts: { vendorId: string; actorUserId: string; memberId: string }) {
  await db.transaction(async (trx) => {
    const member = await trx("members")
      .where({ id: opts.memberId, vendor_id: opts.vendorId })
      .forUpdate()
      .first<{ role: Role; user_id: string } | undefined>("role", "user_id");
    if (!member) throw new NotFound();
    if (member.role === "admin") await assertAnotherAdminRemains(trx as unknown as typeof db, opts.vendorId, opts.memberId);
    await trx("members").where({ id: opts.memberId, vendor_id: opts.vendorId }).delete();
    // Their tokens for this vendor stop, and their sessions end (a JWT cannot be recalled otherwise).
    await trx("api_tokens")
      .where({ vendor_id: opts.vendorId, user_id: member.user_id })
      .whereNull("revoked_at")
      .update({ revoked_at: trx.fn.now() });
    await endSessions(member.user_id, trx);
    await writeAudit(
      {
        vendorId: opts.vendorId,
        actorUserId: opts.actorUserId,
        action: "member.remove",
        objectType: "member",
        objectId: opts.memberId,
        details: { role: member.role, userId: member.user_id },
      },
      trx,
    );
  });
}
