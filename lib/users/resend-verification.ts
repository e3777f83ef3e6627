import "server-only";

import { db } from "@/lib/db/knex";
import { consumeRateLimit } from "@/lib/rate-limit/consume-rate-limit";

import { sendVerificationMail } from "./send-verification-mail";

export const RESEND_LIMITS = {
  perAccount: { limit: 3, windowSeconds: 60 * 60 },
  perIp: { limit: 10, windowSeconds: 60 * 60 },
};

/** Confirmation mails to one address, whether sent by sign-up or by "send it again", share this budget. */
export function consumeAccountMailLimit(email: string): Promise<number> {
  return consumeRateLimit({ key: `verify-resend:account:${email}`, ...RESEND_LIMITS.perAccount });
}

/**
 * Mails a new confirmation link to an unconfirmed password account. The caller answers the same whatever
 * happened, so this does not reveal which addresses have accounts. Throws RateLimited past the limits.
 */
export async function resendVerification(opts: { email: string; ip: string; vendorSlug?: string }): Promise<void> {
  await consumeRateLimit({ key: `verify-resend:ip:${opts.ip}`, ...RESEND_LIMITS.perIp });
  await consumeAccountMailLimit(opts.email);
  const user = await db("users")
    .where({ email: opts.email })
    .whereNull("email_verified")
    .whereNotNull("password_hash")
    .first<{ id: string; email: string; password_hash: string } | undefined>("id", "email", "password_hash");
  if (user)
    await sendVerificationMail(db, { userId: user.id, email: user.email, passwordHash: user.password_hash, vendorSlug: opts.vendorSlug });
}
