import "server-only";

import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import EmailProvider from "next-auth/providers/email";

import { db } from "@/lib/db/knex";
import { RateLimited } from "@/lib/errors/domain-errors";
import { clientIp } from "@/lib/http/client-ip";
import { enqueueMail } from "@/lib/mail/enqueue-mail";
import { assertUnderRateLimit, consumeRateLimit, resetRateLimit } from "@/lib/rate-limit/consume-rate-limit";

import { credentialsSchema } from "./auth-schemas";
import { knexAdapter } from "./knex-adapter";
import { verifyPassword } from "./passwords";

export const SIGN_IN_LIMITS = {
  perAccount: { limit: 8, windowSeconds: 15 * 60 },
  perIp: { limit: 40, windowSeconds: 15 * 60 },
};

export async function authorizePassword(raw: unknown, headers: Record<string, string | string[] | undefined>) {
  const parsed = credentialsSchema.safeParse(raw);
  if (!parsed.success) return null;
  const { email, password } = parsed.data;
  const accountKey = `sign-in:account:${email}`;
  const ipKey = `sign-in:ip:${clientIp(headers)}`;
  try {
    // Only failures count, so a busy office behind one address is not locked out by its own sign-ins.
    await assertUnderRateLimit({ key: ipKey, ...SIGN_IN_LIMITS.perIp });
    await assertUnderRateLimit({ key: accountKey, ...SIGN_IN_LIMITS.perAccount });
  } catch (error) {
    if (error instanceof RateLimited) throw new Error("rate_limited");
    throw error;
  }
  const user = await db("users").where({ email }).first<{ id: string; email: string; name: string; password_hash: string | null } | undefined>();
  // Verify even for unknown accounts so timing does not reveal which e-mails exist.
  const ok = await verifyPassword(user?.password_hash ?? "$argon2id$v=19$m=19456,t=2,p=1$c2FsdHNhbHQ$ZmFrZWZha2VmYWtlZmFrZQ", password);
  if (!user || !ok) {
    await consumeRateLimit({ key: ipKey, limit: Number.MAX_SAFE_INTEGER, windowSeconds: SIGN_IN_LIMITS.perIp.windowSeconds });
    await consumeRateLimit({ key: accountKey, limit: Number.MAX_SAFE_INTEGER, windowSeconds: SIGN_IN_LIMITS.perAccount.windowSeconds });
    return null;
  }
  await resetRateLimit(accountKey);
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
    async signIn({ user, account }) {
      if (account?.provider !== "email") return true;
      // Magic links only for existing accounts: new people sign up or accept an invitation.
      const email = (user.email ?? "").toLowerCase();
      await consumeRateLimit({ key: `magic-link:${email}`, limit: 5, windowSeconds: 15 * 60 }).catch(() => {
        throw new Error("rate_limited");
      });
      return Boolean(await db("users").where({ email }).first("id"));
    },
    async jwt({ token, user }) {
      if (user) token.sub = user.id;
      return token;
    },
    async session({ session, token }) {
      if (session.user && token.sub) session.user.id = token.sub;
      return session;
    },
  },
};
