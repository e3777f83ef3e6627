import "server-only";

import type { Adapter, AdapterUser } from "next-auth/adapters";

import { db } from "@/lib/db/knex";

type UserRow = { id: string; email: string; name: string; email_verified: Date | null };

const toAdapterUser = (row: UserRow): AdapterUser => ({
  id: row.id,
  email: row.email,
  name: row.name,
  emailVerified: row.email_verified,
});

// The part of the adapter contract the e-mail (magic link) provider uses with JWT sessions.
// Users are never created here: sign-up and invitations create them.
export const knexAdapter: Adapter = {
  async getUser(id) {
    const row = await db("users").where({ id }).first<UserRow | undefined>();
    return row ? toAdapterUser(row) : null;
  },
  async getUserByEmail(email) {
    const row = await db("users").where({ email }).first<UserRow | undefined>();
    return row ? toAdapterUser(row) : null;
  },
  async createUser() {
    throw new Error("Accounts are created by sign-up or invitation.");
  },
  // Called when a magic link signs someone in, which proves the address. A password set on a never-confirmed
  // account was chosen by whoever signed up, not necessarily the owner of the address, so it is dropped.
  async updateUser(user) {
    const { rows } = await db.raw<{ rows: UserRow[] }>(
      `update users set
         password_hash = case when email_verified is null then null else password_hash end,
         email_verified = coalesce(email_verified, ?::timestamptz),
         updated_at = now()
       where id = ? returning id, email, name, email_verified`,
      [user.emailVerified ?? null, user.id],
    );
    return toAdapterUser(rows[0]);
  },
  async getUserByAccount() {
    return null;
  },
  async createVerificationToken(token) {
    await db("verification_tokens").insert(token);
    return token;
  },
  async useVerificationToken({ identifier, token }) {
    const [row] = await db("verification_tokens")
      .where({ identifier, token })
      .delete()
      .returning<{ identifier: string; token: string; expires: Date }[]>(["identifier", "token", "expires"]);
    return row ?? null;
  },
};
