import "server-only";

import { writeAudit } from "@/lib/audit/write-audit";
import { hashToken, newTokenSecret } from "@/lib/auth/api-tokens";
import { db } from "@/lib/db/knex";
import { NotFound } from "@/lib/errors/domain-errors";

export type TokenSummary = { id: string; name: string; prefix: string; createdAt: Date; lastUsedAt: Date | null; revokedAt: Date | null };

/** A personal access token for one member in one vendor; the secret is returned once and stored hashed. */
export async function createPersonalToken({ vendorId, userId, name }: { vendorId: string; userId: string; name: string }) {
  const member = await db("members").where({ vendor_id: vendorId, user_id: userId }).first("id");
  if (!member) throw new NotFound("Not a member of this vendor.");
  const secret = newTokenSecret();
  const [row] = await db("api_tokens")
    .insert({ vendor_id: vendorId, user_id: userId, name, prefix: secret.slice(0, 12), token_hash: hashToken(secret) })
    .returning("id");
  await writeAudit({
    vendorId,
    actorUserId: userId,
    action: "api_token.create",
    objectType: "api_token",
    objectId: row.id,
    details: { name },
  });
  return { id: row.id as string, secret, prefix: secret.slice(0, 12) };
}

export async function listPersonalTokens({ vendorId, userId }: { vendorId: string; userId: string }): Promise<TokenSummary[]> {
  const rows = await db("api_tokens").where({ vendor_id: vendorId, user_id: userId }).orderBy("created_at", "desc");
  return rows.map((r) => ({
    id: r.id,
    name: r.name,
    prefix: r.prefix,
    createdAt: r.created_at,
    lastUsedAt: r.last_used_at,
    revokedAt: r.revoked_at,
  }));
}

export async function revokePersonalToken({ vendorId, userId, id }: { vendorId: string; userId: string; id: string }) {
  const count = await db("api_tokens")
    .where({ vendor_id: vendorId, user_id: userId, id })
    .whereNull("revoked_at")
    .update({ revoked_at: db.fn.now() });
  if (!count) throw new NotFound("No such active token.");
  await writeAudit({ vendorId, actorUserId: userId, action: "api_token.revoke", objectType: "api_token", objectId: id });
}
