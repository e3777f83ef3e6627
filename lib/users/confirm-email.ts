import "server-only";

import { peekVerificationUser, readVerificationToken } from "@/lib/auth/email-verification-token";
import { verifyPassword } from "@/lib/auth/passwords";
import { db } from "@/lib/db/knex";
import { InvalidInput } from "@/lib/errors/domain-errors";

/**
 * Marks the address of a signed confirmation link as proven; confirming twice is harmless. The person must also
 * type the password chosen at sign-up: otherwise someone who signed up with another person's address could have
 * that person confirm the squatter's password by clicking the mailed link.
 */
export async function confirmEmail({ token, password }: { token: string; password: string }): Promise<{ userId: string; email: string }> {
  const invalid = new InvalidInput("This confirmation link is not valid or has expired. Sign in to have a new one sent.");
  const candidate = peekVerificationUser(token);
  if (!candidate) throw invalid;
  const user = await db("users")
    .where({ id: candidate })
    .first<{ id: string; email: string; password_hash: string | null } | undefined>("id", "email", "password_hash");
  const userId = readVerificationToken(token, (id) =>
    user && user.id === id ? { email: user.email, passwordHash: user.password_hash } : undefined,
  );
  if (!user || !userId) throw invalid;
  if (!(await verifyPassword(user.password_hash, password))) {
    const wrong = "That is not the password this account was created with. If you did not create it, do not confirm.";
    throw new InvalidInput(wrong, { password: [wrong] });
  }
  // The password must still be the one the link was mailed for (checked in the same statement).
  await db("users")
    .where({ id: userId })
    .whereNull("email_verified")
    .where((q) => (user.password_hash === null ? q.whereNull("password_hash") : q.where({ password_hash: user.password_hash })))
    .update({ email_verified: db.fn.now(), updated_at: db.fn.now() });
  return { userId, email: user.email };
}
