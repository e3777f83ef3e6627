import "server-only";

import { hashPassword, verifyPassword } from "@/lib/auth/passwords";
import { db } from "@/lib/db/knex";
import { InvalidInput } from "@/lib/errors/domain-errors";

import { endSessions } from "./end-sessions";

/**
 * Replaces a person's password after checking the current one (an account that signs in by e-mail link only has
 * none to check); every existing session of theirs ends, the one that asked too.
 */
export async function changePassword(opts: { userId: string; currentPassword: string; newPassword: string }): Promise<void> {
  const user = await db("users").where({ id: opts.userId }).first<{ password_hash: string | null } | undefined>("password_hash");
  if (!user) throw new InvalidInput("This account no longer exists.");
  if (user.password_hash && !(await verifyPassword(user.password_hash, opts.currentPassword))) {
    throw new InvalidInput("The current password is not right.", { currentPassword: ["The current password is not right."] });
  }
  const passwordHash = await hashPassword(opts.newPassword);
  await db.transaction(async (trx) => {
    await trx("users").where({ id: opts.userId }).update({ password_hash: passwordHash, updated_at: trx.fn.now() });
    await endSessions(opts.userId, trx);
  });
}
