import { createHmac, timingSafeEqual } from "node:crypto";

const UUID = "[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}";
const ADDRESS = new RegExp(`^reply\\+(${UUID})\\.([0-9a-f]{32})@(.+)$`, "i");

export const inboundMailDomain = () => process.env.INBOUND_MAIL_DOMAIN ?? "swarfbook.localhost";

function secret(): string {
  const value = process.env.REPLY_SECRET ?? process.env.NEXTAUTH_SECRET ?? (process.env.NODE_ENV === "production" ? undefined : "swarfbook-dev-reply-secret");
  if (!value) throw new Error("REPLY_SECRET or NEXTAUTH_SECRET must be set to sign reply addresses.");
  return value;
}

const sign = (ticketId: string) => createHmac("sha256", secret()).update(`ticket-reply:${ticketId.toLowerCase()}`).digest("hex").slice(0, 32);

/** The Reply-To of a ticket notification: reply+<ticketId>.<hmac>@<domain>. */
export function replyAddress(ticketId: string): string {
  return `reply+${ticketId.toLowerCase()}.${sign(ticketId)}@${inboundMailDomain()}`;
}

/** The ticket id of a genuine reply address, or null for anything unsigned, forged or for another domain. */
export function verifyReplyAddress(address: string): string | null {
  const match = ADDRESS.exec(address.trim());
  if (!match) return null;
  const [, ticketId, mac, domain] = match;
  if (domain.toLowerCase() !== inboundMailDomain().toLowerCase()) return null;
  const expected = Buffer.from(sign(ticketId), "hex");
  const given = Buffer.from(mac.toLowerCase(), "hex");
  return given.length === expected.length && timingSafeEqual(given, expected) ? ticketId.toLowerCase() : null;
}
