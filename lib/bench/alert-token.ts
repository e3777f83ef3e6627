import "server-only";

import { createHmac, timingSafeEqual } from "node:crypto";

// The stop link works without signing in, so it carries its own proof: an HMAC over vendor and user.
function secret(): string {
  const value = process.env.NEXTAUTH_SECRET ?? (process.env.NODE_ENV === "production" ? undefined : "swarfbook-dev-alert-secret");
  if (!value) throw new Error("NEXTAUTH_SECRET must be set to sign stop links.");
  return value;
}

const sign = (payload: string) => createHmac("sha256", secret()).update(`change-alerts:${payload}`).digest("base64url");

export function createAlertStopToken({ vendorId, userId }: { vendorId: string; userId: string }): string {
  const payload = Buffer.from(`${vendorId}.${userId}`).toString("base64url");
  return `${payload}.${sign(payload)}`;
}

/** The vendor and user a stop token was made for, or null when it was altered or is malformed. */
export function readAlertStopToken(token: string): { vendorId: string; userId: string } | null {
  const [payload, signature, extra] = token.split(".");
  if (!payload || !signature || extra !== undefined) return null;
  const expected = Buffer.from(sign(payload));
  const given = Buffer.from(signature);
  if (expected.length !== given.length || !timingSafeEqual(expected, given)) return null;
  const [vendorId, userId] = Buffer.from(payload, "base64url").toString("utf8").split(".");
  const uuid = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
  return vendorId && userId && uuid.test(vendorId) && uuid.test(userId) ? { vendorId, userId } : null;
}
