import { createHmac, timingSafeEqual } from "node:crypto";

export const SIGNATURE_HEADER = "Swarfbook-Signature";
export const TIMESTAMP_HEADER = "Swarfbook-Timestamp";
export const EVENT_HEADER = "Swarfbook-Event";
export const DELIVERY_HEADER = "Swarfbook-Delivery";
/** Receivers should refuse a timestamp further than this from their clock. */
export const REPLAY_WINDOW_SECONDS = 300;

/** HMAC-SHA256 over "<timestamp>.<body>", hex, written as "sha256=<hex>". */
export function signPayload(secret: string, timestamp: number, body: string): string {
  return `sha256=${createHmac("sha256", secret).update(`${timestamp}.${body}`).digest("hex")}`;
}

/** What a receiver does, in code: the documented check (also used by the tests' receiver). */
export function verifySignature(o: {
  secret: string;
  timestamp: string | null;
  signature: string | null;
  body: string;
  now?: number;
}): boolean {
  if (!o.timestamp || !o.signature || !/^\d{1,12}$/.test(o.timestamp)) return false;
  const now = o.now ?? Math.floor(Date.now() / 1000);
  if (Math.abs(now - Number(o.timestamp)) > REPLAY_WINDOW_SECONDS) return false;
  const expected = Buffer.from(signPayload(o.secret, Number(o.timestamp), o.body));
  const given = Buffer.from(o.signature);
  return expected.length === given.length && timingSafeEqual(expected, given);
}
