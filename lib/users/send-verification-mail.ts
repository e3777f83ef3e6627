import "server-only";

import type { Knex } from "knex";

import { createVerificationToken, VERIFICATION_HOURS } from "@/lib/auth/email-verification-token";
import { appUrl } from "@/lib/http/app-url";
import { enqueueMail } from "@/lib/mail/enqueue-mail";

const SLUG = /^[a-z0-9-]{1,60}$/;

/** Mail the link that proves the person owns the address (queued in the caller's transaction); until then the password does not sign in. */
export async function sendVerificationMail(
  trx: Knex | Knex.Transaction,
  opts: { userId: string; email: string; passwordHash: string | null; vendorSlug?: string },
): Promise<void> {
  const token = createVerificationToken({ userId: opts.userId, email: opts.email, passwordHash: opts.passwordHash });
  const vendor = opts.vendorSlug && SLUG.test(opts.vendorSlug) ? `&vendor=${opts.vendorSlug}` : "";
  const link = appUrl(`/verify-email?token=${token}${vendor}`);
  await enqueueMail(trx, {
    to: opts.email,
    subject: "Confirm your e-mail for Swarfbook",
    text:
      `Someone created a Swarfbook account with this address. If it was you, open this link and confirm with ` +
      `the password you chose (valid for ${VERIFICATION_HOURS} hours):\n\n${link}\n\n` +
      `If you did not create it yourself, do not confirm, even if someone asks you to: without confirmation ` +
      `the account cannot be used.`,
  });
}
