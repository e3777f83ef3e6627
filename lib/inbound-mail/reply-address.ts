import { createHmac, timingSafeEqual } from "node:crypto";

// reply+<ticket>.<recipient>.<expiry>.<mac>@<domain>: both ids as 32 hex digits (mail systems may change the
// case of a local part, so only case-free characters), the expiry as a day number (days since 1970) in hex,
// the MAC over all three. The address is bound to the person it was mailed to: a reply is attributed to that
// person, never to whoever the From header names. Addresses mailed before expiries were added have no expiry
// part (reply+<ticket>.<recipient>.<mac>) and stay valid.
const ADDRESS = /^reply\+([0-9a-f]{32})\.([0-9a-f]{32})\.(?:([0-9a-f]{1,8})\.)?([0-9a-f]{32})@(.+)$/i;
const DAY = 86_400_000;

/** REPLY_ADDRESS_DAYS: how long a reply address in a notification can be answered (180 days by default). */
export function replyAddressDays(): number {
  const days = Number(process.env.REPLY_ADDRESS_DAYS ?? "180");
  return Number.isFinite(days) && days > 0 ? Math.ceil(days) : 180;
}

export const inboundMailDomain = () => process.env.INBOUND_MAIL_DOMAIN ?? "swarfbook.localhost";

function secret(): string {
  const value =
    process.env.REPLY_SECRET ??
    process.env.NEXTAUTH_SECRET ??
    (process.env.NODE_ENV === "production" ? undefined : "swarfbook-dev-reply-secret");
  if (!value) throw new Error("REPLY_SECRET or NEXTAUTH_SECRET must be set to sign reply addresses.");
  return value;
}

const compact = (uuid: string) => uuid.replace(/-/g, "").toLowerCase();
const expand = (hex: string) =>
  `${hex.slice(0, 8)}-${hex.slice(8, 12)}-${hex.slice(12, 16)}-${hex.slice(16, 20)}-${hex.slice(20)}`.toLowerCase();
const sign = (ticketHex: string, userHex: string, expiryHex?: string) =>
  createHmac("sha256", secret())
    .update(
      `ticket-reply:${ticketHex.toLowerCase()}:${userHex.toLowerCase()}${expiryHex === undefined ? "" : `:until:${expiryHex.toLowerCase()}`}`,
    )
    .digest("hex")
    .slice(0, 32);

export type ReplyTarget = { ticketId: string; userId: string };

/** The Reply-To of a ticket notification mailed to one person. */
export function replyAddress({ ticketId, userId, now = Date.now() }: ReplyTarget & { now?: number }): string {
  const t = compact(ticketId);
  const u = compact(userId);
  const e = (Math.floor(now / DAY) + replyAddressDays()).toString(16);
  return `reply+${t}.${u}.${e}.${sign(t, u, e)}@${inboundMailDomain()}`;
}

/** The ticket and recipient of a genuine reply address, or null for anything unsigned, forged, expired or for another domain. */
export function verifyReplyAddress(address: string, now = Date.now()): ReplyTarget | null {
  const match = ADDRESS.exec(address.trim());
  if (!match) return null;
  const [, t, u, e, mac, domain] = match;
  if (domain.toLowerCase() !== inboundMailDomain().toLowerCase()) return null;
  if (e !== undefined && parseInt(e, 16) < Math.floor(now / DAY)) return null;
  const expected = Buffer.from(sign(t, u, e), "hex");
  const given = Buffer.from(mac.toLowerCase(), "hex");
  return given.length === expected.length && timingSafeEqual(given, expected) ? { ticketId: expand(t), userId: expand(u) } : null;
}
