import "server-only";

import { createCipheriv, createDecipheriv, createHash, hkdfSync, randomBytes } from "node:crypto";

// Webhook secrets must come back for signing, so they are encrypted (AES-256-GCM), not hashed. The key is
// WEBHOOK_SECRET_KEY (32 bytes, base64 or hex); without it one is derived from NEXTAUTH_SECRET, so a leaked
// database alone does not reveal the secrets.
function key(): Buffer {
  const configured = process.env.WEBHOOK_SECRET_KEY?.trim();
  if (configured) {
    const bytes = /^[0-9a-f]{64}$/i.test(configured) ? Buffer.from(configured, "hex") : Buffer.from(configured, "base64");
    if (bytes.length !== 32) throw new Error("WEBHOOK_SECRET_KEY must be 32 bytes, base64 or hex.");
    return bytes;
  }
  const secret = process.env.NEXTAUTH_SECRET;
  if (!secret) throw new Error("Set WEBHOOK_SECRET_KEY or NEXTAUTH_SECRET to store webhook secrets.");
  return Buffer.from(hkdfSync("sha256", secret, "swarfbook", "webhook-secrets", 32));
}

/** "v1.<iv>.<tag>.<ciphertext>", base64url parts. */
export function sealSecret(plain: string): string {
  const iv = randomBytes(12);
  const cipher = createCipheriv("aes-256-gcm", key(), iv);
  const body = Buffer.concat([cipher.update(plain, "utf8"), cipher.final()]);
  return ["v1", iv.toString("base64url"), cipher.getAuthTag().toString("base64url"), body.toString("base64url")].join(".");
}

export function openSecret(sealed: string): string {
  const [version, iv, tag, body] = sealed.split(".");
  if (version !== "v1" || !iv || !tag || !body) throw new Error("Unreadable webhook secret.");
  const decipher = createDecipheriv("aes-256-gcm", key(), Buffer.from(iv, "base64url"));
  decipher.setAuthTag(Buffer.from(tag, "base64url"));
  return Buffer.concat([decipher.update(Buffer.from(body, "base64url")), decipher.final()]).toString("utf8");
}

export const WEBHOOK_SECRET_PREFIX = "sbwh_";

export function newWebhookSecret(): string {
  return WEBHOOK_SECRET_PREFIX + randomBytes(32).toString("base64url");
}

/** What the log may show of a secret: enough to tell two apart, nothing to sign with. */
export function secretHint(secret: string): string {
  return `${secret.slice(0, WEBHOOK_SECRET_PREFIX.length + 4)}…${createHash("sha256").update(secret).digest("hex").slice(0, 4)}`;
}
