import "server-only";

import { randomBytes } from "node:crypto";

import { roleWord } from "@/lib/audit/action-labels";
import { writeAudit } from "@/lib/audit/write-audit";
import { hashToken } from "@/lib/auth/api-tokens";
import type { Role } from "@/lib/auth/roles";
import { db } from "@/lib/db/knex";
import { Conflict } from "@/lib/errors/domain-errors";
import { appUrl } from "@/lib/http/app-url";
import { enqueueMail } from "@/lib/mail/enqueue-mail";

export const INVITATION_DAYS = 7;

/** Invite a staff member by e-mail: a single-use link that expires. */
export async function inviteMember(opts: {
  vendorId: string;
  vendorSlug: string;
  vendorName: string;
  actorUserId: string;
  email: string;
  role: Role;
}): Promise<{ invitationId: string; token: string }> {
  const existing = await db("members as m")
    .join("users as u", "u.id", "m.user_id")
    .where({ "m.vendor_id": opts.vendorId, "u.email": opts.email })
    // An unconfirmed sign-up may be someone squatting the address; it must not block the real person's invitation.
    .whereNotNull("u.email_verified")
    .first("m.id");
  if (existing) throw new Conflict(`${opts.email} is already a member.`);
  const token = randomBytes(32).toString("base64url");
  const invitationId = await db.transaction(async (trx) => {
    await trx("invitations")
      .where({ vendor_id: opts.vendorId, email: opts.email })
      .whereNull("accepted_at")
      .update({ revoked_at: trx.fn.now() });
    const [row] = await trx("invitations")
      .insert({
        vendor_id: opts.vendorId,
        email: opts.email,
        role: opts.role,
        token_hash: hashToken(token),
        invited_by: opts.actorUserId,
        expires_at: new Date(Date.now() + INVITATION_DAYS * 86_400_000),
      })
      .returning("id");
    await writeAudit(
      {
        vendorId: opts.vendorId,
        actorUserId: opts.actorUserId,
        action: "member.invite",
        objectType: "invitation",
        objectId: row.id,
        details: { email: opts.email, role: opts.role },
      },
      trx,
    );
    const link = appUrl(`/${opts.vendorSlug}/join/${token}`);
    await enqueueMail(
      trx,
      {
        to: opts.email,
        subject: `You are invited to ${opts.vendorName} on Swarfbook`,
        text: `You have been invited to join ${opts.vendorName} on Swarfbook as ${roleWord(opts.role)}.\n\nAccept the invitation (valid for ${INVITATION_DAYS} days, once):\n${link}\n`,
      },
      { key: `invitation:${row.id}` },
    );
    return row.id as string;
  });
  return { invitationId, token };
}
