import "server-only";

import { hashToken } from "@/lib/auth/api-tokens";
import { hashPassword } from "@/lib/auth/passwords";
import type { Role } from "@/lib/auth/roles";
import { writeAudit } from "@/lib/audit/write-audit";
import { db } from "@/lib/db/knex";
import { InvalidInput, NotFound } from "@/lib/errors/domain-errors";

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

export async function acceptInvitation(opts: { vendorId: string; token: string; name: string; password?: string }) {
  return db.transaction(async (trx) => {
    const invitation = await findOpenInvitation(opts);
    // Single use even under a double click: the conditional update claims the invitation.
    const claimed = await trx("invitations").where({ id: invitation.id }).whereNull("accepted_at").update({ accepted_at: trx.fn.now() });
    if (claimed !== 1) throw new NotFound("This invitation link was already used.");
    let user = await trx("users").where({ email: invitation.email }).first<{ id: string; password_hash: string | null } | undefined>("id", "password_hash");
    if (!user) {
      if (!opts.password) throw new InvalidInput("Choose a password.", { password: ["Choose a password of at least 10 characters."] });
      [user] = await trx("users")
        .insert({ email: invitation.email, name: opts.name, password_hash: await hashPassword(opts.password), email_verified: trx.fn.now() })
        .returning(["id", "password_hash"]);
    }
    await trx("members")
      .insert({ vendor_id: opts.vendorId, user_id: user!.id, role: invitation.role })
      .onConflict(["vendor_id", "user_id"])
      .merge({ role: invitation.role, updated_at: trx.fn.now() });
    await writeAudit(
      { vendorId: opts.vendorId, actorUserId: user!.id, action: "member.join", objectType: "invitation", objectId: invitation.id, details: { role: invitation.role } },
      trx,
    );
    return { userId: user!.id, email: invitation.email, role: invitation.role };
  });
}
