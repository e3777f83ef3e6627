import "server-only";

import { createHmac, timingSafeEqual } from "node:crypto";

import { isUuid } from "@/lib/ids/is-uuid";

// A confirmation link carries its own proof: an HMAC over the user, the address it was mailed to, the pending
// password and the expiry. Binding the password means that if someone else signs up again with the same address
// (replacing the unproven password), the links mailed before stop working: a click confirms only the password that
// was pending when the link was mailed.
export const VERIFICATION_HOURS = 48;

function secret(): string {
  const value = process.env.NEXTAUTH_SECRET ?? (process.env.NODE_ENV === "production" ? undefined : "swarfbook-dev-verify-secret");
  if (!value) throw new Error("NEXTAUTH_SECRET must be set to sign e-mail confirmation links.");
  return value;
}

type Bound = { email: string; passwordHash: string | null };
const sign = (payload: string, { email, passwordHash }: Bound) =>
  createHmac("sha256", secret())
    .update(`verify-email:${payload}:${email.toLowerCase()}:${passwordHash ?? ""}`)
    .digest("base64url");

export function createVerificationToken({ userId, now = Date.now(), ...bound }: Bound & { userId: string; now?: number }): string {
  const payload = Buffer.from(`${userId}.${now + VERIFICATION_HOURS * 3_600_000}`).toString("base64url");
  return `${payload}.${sign(payload, bound)}`;
}

/** The user id a link was made for, if its signature holds for the account as it is now and it has not expired. */
export function readVerificationToken(token: string, accountOf: (userId: string) => Bound | undefined, now = Date.now()): string | null {
  const [payload, signature, extra] = token.split(".");
  if (!payload || !signature || extra !== undefined) return null;
  const [userId, expires] = Buffer.from(payload, "base64url").toString("utf8").split(".");
  if (!userId || !isUuid(userId) || !/^\d+$/.test(expires ?? "") || Number(expires) < now) return null;
  const account = accountOf(userId);
  if (!account) return null;
  const expected = Buffer.from(sign(payload, account));
  const given = Buffer.from(signature);
  return expected.length === given.length && timingSafeEqual(expected, given) ? userId : null;
}

/** The user id inside a token, before its signature is checked (to look up the address it must match). */
export function peekVerificationUser(token: string): string | null {
  const userId = Buffer.from(token.split(".")[0] ?? "", "base64url")
    .toString("utf8")
    .split(".")[0];
  return userId && isUuid(userId) ? userId : null;
}
