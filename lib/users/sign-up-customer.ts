import "server-only";

import { hashPassword } from "@/lib/auth/passwords";
import { writeAudit } from "@/lib/audit/write-audit";
import { db } from "@/lib/db/knex";
import { Conflict } from "@/lib/errors/domain-errors";

/**
 * Customer self sign-up on a vendor's portal. An existing account (a customer of another
 * vendor) is not taken over: that person signs in first and joins from the vendor's page.
 */
export async function signUpCustomer(opts: { vendorId: string; name: string; email: string; password: string }) {
  return db.transaction(async (trx) => {
    const existing = await trx("users").where({ email: opts.email }).first("id");
    if (existing) throw new Conflict("An account with this e-mail exists. Sign in, then join this vendor from its page.");
    const [user] = await trx("users")
      .insert({ email: opts.email, name: opts.name, password_hash: await hashPassword(opts.password) })
      .returning("id");
    await trx("members").insert({ vendor_id: opts.vendorId, user_id: user.id, role: "customer" });
    await writeAudit({ vendorId: opts.vendorId, actorUserId: user.id, action: "member.sign-up", objectType: "user", objectId: user.id }, trx);
    return { userId: user.id as string };
  });
}

/** A signed-in person becomes a customer of one more vendor. */
export async function joinAsCustomer(opts: { vendorId: string; userId: string }) {
  await db("members").insert({ vendor_id: opts.vendorId, user_id: opts.userId, role: "customer" }).onConflict(["vendor_id", "user_id"]).ignore();
  await writeAudit({ vendorId: opts.vendorId, actorUserId: opts.userId, action: "member.join-customer", objectType: "user", objectId: opts.userId });
}
