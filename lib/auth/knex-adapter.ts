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
  async updateUser(user) {
    const [row] = await db("users")
      .where({ id: user.id })
      .update({ email_verified: user.emailVerified ?? null, updated_at: db.fn.now() })
      .returning<UserRow[]>(["id", "email", "name", "email_verified"]);
    return toAdapterUser(row);
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
