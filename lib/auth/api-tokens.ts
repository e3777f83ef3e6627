import "server-only";

import { createHash, randomBytes } from "node:crypto";

import { db } from "@/lib/db/knex";

import type { SessionUser } from "./session-user";

export const TOKEN_PREFIX = "sbk_";

export function hashToken(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}

export function newTokenSecret(): string {
  return TOKEN_PREFIX + randomBytes(24).toString("base64url");
}

/** The user behind a personal access token, only if the token belongs to this vendor. */
export async function userForApiToken(token: string, vendorId: string): Promise<SessionUser | null> {
  return (await apiTokenOwner(token, vendorId))?.user ?? null;
}

/** The token's id (for its rate-limit bucket) and its user, only if the token is valid for this vendor. */
export async function apiTokenOwner(token: string, vendorId: string): Promise<{ tokenId: string; user: SessionUser } | null> {
  if (!token.startsWith(TOKEN_PREFIX) || token.length > 100) return null;
  // The token works only during the membership it was made in: removing the member ends it, and rejoining
  // (a new membership row, created after the token) does not bring it back.
  const row = await db("api_tokens as t")
    .join("users as u", "u.id", "t.user_id")
    .join("members as m", (j) => j.on("m.vendor_id", "t.vendor_id").andOn("m.user_id", "t.user_id"))
    .where({ "t.token_hash": hashToken(token), "t.vendor_id": vendorId })
    .whereNull("t.revoked_at")
    .whereRaw("m.created_at <= t.created_at")
    .first<{ token_id: string; id: string; email: string; name: string; is_operator: boolean } | undefined>(
      "t.id as token_id",
      "u.id",
      "u.email",
      "u.name",
      "u.is_operator",
    );
  if (!row) return null;
  await db("api_tokens").where({ id: row.token_id }).update({ last_used_at: db.fn.now() });
  return { tokenId: row.token_id, user: { id: row.id, email: row.email, name: row.name, isOperator: row.is_operator } };
}
