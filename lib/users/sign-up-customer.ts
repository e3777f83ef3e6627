import "server-only";

import { writeAudit } from "@/lib/audit/write-audit";
import { hashPassword } from "@/lib/auth/passwords";
import { db } from "@/lib/db/knex";
import { Conflict } from "@/lib/errors/domain-errors";

import { consumeAccountMailLimit } from "./resend-verification";
import { sendVerificationMail } from "./send-verification-mail";

/**
 * Customer self sign-up on a vendor's portal. The password signs in only after the e-mailed link proves the
 * address, so nobody can hold an account in someone else's name. A confirmed account (a customer of another
 * vendor) is not taken over: that person signs in first and joins from the vendor's page. An unconfirmed one
 * never proved its address, so signing up again replaces its pending password and mails a new link. Every
 * sign-up mails the address, so it counts against the same per-address limit as "send the link again"
 * (otherwise repeated sign-ups from many client addresses would mail anyone without end).
 */
export async function signUpCustomer(opts: { vendorId: string; vendorSlug?: string; name: string; email: string; password: string }) {
  await consumeAccountMailLimit(opts.email);
  const passwordHash = await hashPassword(opts.password);
  const userId = await db.transaction(async (trx) => {
    const existing = await trx("users")
      .where({ email: opts.email })
      .forUpdate()
      .first<{ id: string; email_verified: Date | null } | undefined>("id", "email_verified");
    if (existing?.email_verified) throw new Conflict("An account with this e-mail exists. Sign in, then join this vendor from its page.");
    let id = existing?.id;
    if (id) {
      await trx("users").where({ id }).update({ name: opts.name, password_hash: passwordHash, updated_at: trx.fn.now() });
    } else {
      [{ id }] = await trx("users")
        .insert({ email: opts.email, name: opts.name, password_hash: passwordHash })
        .returning<{ id: string }[]>("id");
    }
    await trx("members").insert({ vendor_id: opts.vendorId, user_id: id, role: "customer" }).onConflict(["vendor_id", "user_id"]).ignore();
    await writeAudit({ vendorId: opts.vendorId, actorUserId: id, action: "member.sign-up", objectType: "user", objectId: id }, trx);
    await sendVerificationMail(trx, { userId: id as string, email: opts.email, passwordHash, vendorSlug: opts.vendorSlug });
    return id as string;
  });
  return { userId };
}

/** A signed-in person becomes a customer of one more vendor. */
export async function joinAsCustomer(opts: { vendorId: string; userId: string }) {
  await db("members")
    .insert({ vendor_id: opts.vendorId, user_id: opts.userId, role: "customer" })
    .onConflict(["vendor_id", "user_id"])
    .ignore();
  await writeAudit({
    vendorId: opts.vendorId,
    actorUserId: opts.userId,
    action: "member.join-customer",
    objectType: "user",
    objectId: opts.userId,
  });
}
