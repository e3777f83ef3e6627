import "server-only";

import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import EmailProvider from "next-auth/providers/email";
import { headers } from "next/headers";

import { credentialsSchema } from "@/content-schema/auth";
import { db } from "@/lib/db/knex";
import { RateLimited } from "@/lib/errors/domain-errors";
import { clientIp } from "@/lib/http/client-ip";
import { enqueueMail } from "@/lib/mail/enqueue-mail";
import { consumeRateLimit, resetRateLimit } from "@/lib/rate-limit/consume-rate-limit";
import { refundRateLimit } from "@/lib/rate-limit/refund-rate-limit";

import { knexAdapter } from "./knex-adapter";
import { isKnownSignInAddress, rememberSignInAddress } from "./known-sign-in-addresses";
import { verifyPassword } from "./passwords";

const WINDOW = 15 * 60;
export const SIGN_IN_LIMITS = {
  /** Attempts on one account from one address: a guesser is stopped without locking the owner out elsewhere. */
  perAccountAndIp: { limit: 8, windowSeconds: WINDOW },
  /** Attempts from one address over all accounts. */
  perIp: { limit: 40, windowSeconds: WINDOW },
  /**
   * Past this many attempts on one account from all addresses, password attempts on it are only slowed, except
   * from an address that has signed in to the account before (so guesses from elsewhere cannot slow the owner).
   */
  perAccountCeiling: { limit: 30, windowSeconds: WINDOW },
  slowed: { limit: 1, windowSeconds: 10 },
};

async function countAttempt(keys: { ip: string; accountIp: string; account: string; slow: string }, known: () => Promise<boolean>) {
  try {
    // Counted before the password is checked, in one atomic statement each: a burst of parallel guesses cannot
    // all pass a check made before any of them was counted.
    await consumeRateLimit({ key: keys.ip, ...SIGN_IN_LIMITS.perIp });
    await consumeRateLimit({ key: keys.accountIp, ...SIGN_IN_LIMITS.perAccountAndIp });
    const accountHits = await consumeRateLimit({ key: keys.account, limit: Number.MAX_SAFE_INTEGER, windowSeconds: WINDOW });
    if (accountHits > SIGN_IN_LIMITS.perAccountCeiling.limit && !(await known()))
      await consumeRateLimit({ key: keys.slow, ...SIGN_IN_LIMITS.slowed });
  } catch (error) {
    if (error instanceof RateLimited) throw new Error("rate_limited");
    throw error;
  }
}

export async function authorizePassword(raw: unknown, headers: Record<string, string | string[] | undefined>) {
  const parsed = credentialsSchema.safeParse(raw);
  if (!parsed.success) return null;
  const { email, password } = parsed.data;
  const ip = clientIp(headers);
  const keys = {
    ip: `sign-in:ip:${ip}`,
    accountIp: `sign-in:account-ip:${email}:${ip}`,
    account: `sign-in:account:${email}`,
    slow: `sign-in:slow:${email}`,
  };
  await countAttempt(keys, () => isKnownSignInAddress(email, ip));
  const user = await db("users")
    .where({ email })
    .first<{ id: string; email: string; name: string; password_hash: string | null; email_verified: Date | null } | undefined>();
  // Verify even for unknown accounts so timing does not reveal which e-mails exist.
  const ok = await verifyPassword(user?.password_hash ?? "$argon2id$v=19$m=19456,t=2,p=1$c2FsdHNhbHQ$ZmFrZWZha2VmYWtlZmFrZQ", password);
  if (!user || !ok) return null;
  // A success gives its attempt back, so a busy office behind one address is not limited by its own sign-ins.
  await Promise.all([refundRateLimit(keys.ip), refundRateLimit(keys.account), resetRateLimit(keys.accountIp)]);
  // Told only to someone who knows the password: the address must be proven before the password works.
  if (!user.email_verified) throw new Error("email_unverified");
  await rememberSignInAddress(email, ip);
  return { id: user.id, email: user.email, name: user.name };
}

export const authOptions: NextAuthOptions = {
  adapter: knexAdapter,
  session: { strategy: "jwt", maxAge: 30 * 24 * 60 * 60 },
  secret: process.env.NEXTAUTH_SECRET,
  pages: { signIn: "/sign-in", verifyRequest: "/sign-in/check-mail", error: "/sign-in" },
  providers: [
    CredentialsProvider({
      id: "password",
      name: "E-mail and password",
      credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
      authorize: (credentials, req) => authorizePassword(credentials, req.headers ?? {}),
    }),
    EmailProvider({
      from: process.env.MAIL_FROM ?? "Swarfbook <no-reply@swarfbook.localhost>",
      maxAge: 15 * 60,
      async sendVerificationRequest({ identifier, url }) {
        // next-auth stored the link's token already; the mail only needs to be queued.
        await enqueueMail(db, {
          to: identifier,
          subject: "Your Swarfbook sign-in link",
          text: `Sign in to Swarfbook with this link (valid for 15 minutes, once):\n\n${url}\n\nIf you did not ask for it, ignore this e-mail.`,
        });
      },
    }),
  ],
  callbacks: {
    async signIn({ user, account, email: emailInfo }) {
      if (account?.provider !== "email") return true;
      // Magic links only for existing accounts: new people sign up or accept an invitation.
      const email = (user.email ?? "").toLowerCase();
      // Count link requests (not the click that uses one). Per address and account, with a looser per-account
      // ceiling against mail floods, so one stranger cannot use up the owner's links (the ceiling does not apply to
      // an address the owner has signed in from before).
      const ip = clientIp(await headers());
      if (emailInfo?.verificationRequest) {
        await consumeRateLimit({ key: `magic-link:${email}:${ip}`, limit: 5, windowSeconds: 15 * 60 })
          .then(async () =>
            (await isKnownSignInAddress(email, ip))
              ? 0
              : consumeRateLimit({ key: `magic-link:${email}`, limit: 20, windowSeconds: 60 * 60 }),
          )
          .catch(() => {
            throw new Error("rate_limited");
          });
      }
      const exists = Boolean(await db("users").where({ email }).first("id"));
      if (exists && !emailInfo?.verificationRequest) await rememberSignInAddress(email, ip);
      return exists;
    },
    async jwt({ token, user }) {
      if (user) {
        token.sub = user.id;
        const row = await db("users").where({ id: user.id }).first<{ session_epoch: number } | undefined>("session_epoch");
        token.epoch = row?.session_epoch ?? 0;
      }
      return token;
    },
    async session({ session, token }) {
      if (session.user && token.sub) {
        session.user.id = token.sub;
        session.user.epoch = token.epoch ?? 0;
      }
      return session;
    },
  },
};
