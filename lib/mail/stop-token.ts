import "server-only";

import { createHmac, timingSafeEqual } from "node:crypto";

import { isUuid } from "@/lib/ids/is-uuid";

// A stop link works without signing in, so it carries its own proof: an HMAC over purpose, vendor and user.
// The purpose is part of the signature: a change-alert link cannot stop the weekly digest, or the reverse.
// "mail-preferences" opens the preferences page of the person the mail went to.
export type StopPurpose = "change-alerts" | "weekly-digest" | "mail-preferences";

function secret(): string {
  const value = process.env.NEXTAUTH_SECRET ?? (process.env.NODE_ENV === "production" ? undefined : "swarfbook-dev-alert-secret");
  if (!value) throw new Error("NEXTAUTH_SECRET must be set to sign stop links.");
  return value;
}

const sign = (purpose: StopPurpose, payload: string) => createHmac("sha256", secret()).update(`${purpose}:${payload}`).digest("base64url");

export function createStopToken(purpose: StopPurpose, { vendorId, userId }: { vendorId: string; userId: string }): string {
  const payload = Buffer.from(`${vendorId}.${userId}`).toString("base64url");
  return `${payload}.${sign(purpose, payload)}`;
}

/** The vendor and user a stop token was made for, or null when it was altered, is malformed or has another purpose. */
export function readStopToken(purpose: StopPurpose, token: string): { vendorId: string; userId: string } | null {
  const [payload, signature, extra] = token.split(".");
  if (!payload || !signature || extra !== undefined) return null;
  const expected = Buffer.from(sign(purpose, payload));
  const given = Buffer.from(signature);
  if (expected.length !== given.length || !timingSafeEqual(expected, given)) return null;
  const [vendorId, userId] = Buffer.from(payload, "base64url").toString("utf8").split(".");
  return vendorId && userId && isUuid(vendorId) && isUuid(userId) ? { vendorId, userId } : null;
}
