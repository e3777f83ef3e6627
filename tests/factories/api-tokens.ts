import { hashToken, newTokenSecret } from "@/lib/auth/api-tokens";
import { db } from "@/lib/db/knex";

/** A personal access token of the user in the vendor; returns the secret a client sends as `Bearer …`. */
export async function createApiToken(vendorId: string, userId: string, name = "test"): Promise<string> {
  const secret = newTokenSecret();
  await db("api_tokens").insert({ vendor_id: vendorId, user_id: userId, name, prefix: secret.slice(0, 8), token_hash: hashToken(secret) });
  return secret;
}
