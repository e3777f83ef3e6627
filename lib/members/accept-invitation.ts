import "server-only";

import { writeAudit } from "@/lib/audit/write-audit";
import { hashToken } from "@/lib/auth/api-tokens";
import { hashPassword } from "@/lib/auth/passwords";
import type { Role } from "@/lib/auth/roles";
import { db } from "@/lib/db/knex";
import { InvalidInput, NotFound, Unauthenticated } from "@/lib/errors/domain-errors";
import { endSessions } from "@/lib/users/end-sessions";

type Invitation = { id: string; vendor_id: string; email: string; role: Role };

/** A valid invitation of this vendor (not expired, not used, not revoked), or NotFound. */
export async function findOpenInvitation({ vendorId, token }: { vendorId: string; token: string }): Promise<Invitation> {
  const row = await db("invitations")
    .where({ vendor_id: vendorId, token_hash: hashToken(token) })
    .whereNull("accepted_at")
    .whereNull("revoked_at")
    .where("expires_at", ">", db.fn.now())
    .first<Invitation | undefined>("id", "vendor_id", "email", "role");
  if (!row) throw new NotFound("This invitation link is not valid any more. Ask your admin for a new one.");
  return row;
}

/**
 * Accepting an invitation attaches a role to an account, so it must be the invited person's own account:
 * - a confirmed account accepts only while signed in as itself (the join page asks it to sign in first);
 * - otherwise the invitation link, mailed to the address, is the proof: a new account is created confirmed, and
 *   a never-confirmed one (perhaps made by someone else with this address) gets the invitee's password in place
 *   of the unproven one.
 */
export async function acceptInvitation(opts: {
  vendorId: string;
  token: string;
  name?: string;
  password?: string;
  sessionUserId: string | null;
}) {
  const passwordHash = opts.password ? await hashPassword(opts.password) : null;
  return db.transaction(async (trx) => {
    const invitation = await findOpenInvitation(opts);
    // Single use even under a double click: the conditional update claims the invitation.
    const claimed = await trx("invitations").where({ id: invitation.id }).whereNull("accepted_at").update({ accepted_at: trx.fn.now() });
    if (claimed !== 1) throw new NotFound("This invitation link was already used.");
    const existing = await trx("users")
      .where({ email: invitation.email })
      .forUpdate()
      .first<{ id: string; email_verified: Date | null } | undefined>("id", "email_verified");
    let userId: string;
    let created = false;
    if (existing?.email_verified) {
      if (opts.sessionUserId !== existing.id) throw new Unauthenticated(`Sign in as ${invitation.email} to accept this invitation.`);
      userId = existing.id;
    } else {
      if (!opts.name) throw new InvalidInput("Enter your name.", { name: ["Enter your name."] });
      if (!passwordHash) throw new InvalidInput("Choose a password.", { password: ["Choose a password of at least 10 characters."] });
      const account = { name: opts.name, password_hash: passwordHash, email_verified: trx.fn.now(), updated_at: trx.fn.now() };
      if (existing) {
        await trx("users").where({ id: existing.id }).update(account);
        await endSessions(existing.id, trx);
        userId = existing.id;
      } else {
        [{ id: userId }] = await trx("users")
          .insert({ email: invitation.email, ...account })
          .returning<{ id: string }[]>("id");
      }
      created = true;
    }
    await trx("members")
      .insert({ vendor_id: opts.vendorId, user_id: userId, role: invitation.role })
      .onConflict(["vendor_id", "user_id"])
      .merge({ role: invitation.role, updated_at: trx.fn.now() });
    await writeAudit(
      {
        vendorId: opts.vendorId,
        actorUserId: userId,
        action: "member.join",
        objectType: "invitation",
        objectId: invitation.id,
        details: { role: invitation.role },
      },
      trx,
    );
    return { userId, email: invitation.email, role: invitation.role, created };
  });
}
