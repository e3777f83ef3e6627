import { createHmac } from "node:crypto";
import { afterEach, describe, expect, it } from "vitest";

import { failedAuthentication, senderAuthenticated } from "@/lib/inbound-mail/authentication-results";
import { replyAddress, verifyReplyAddress } from "@/lib/inbound-mail/reply-address";
import { stripQuotedText } from "@/lib/inbound-mail/strip-quoted";

const ID = "0b8a4b52-3c1f-4c7e-9d51-6a1e2f3b4c5d";

afterEach(() => {
  delete process.env.REPLY_SECRET;
  delete process.env.INBOUND_MAIL_DOMAIN;
  delete process.env.REPLY_ADDRESS_DAYS;
});

const USER = "7f1c2d3e-4b5a-4c6d-8e9f-0a1b2c3d4e5f";
const hex = (uuid: string) => uuid.replace(/-/g, "");

describe("signed reply addresses", () => {
  it("is reply+<ticket>.<recipient>.<expiry day>.<HMAC-SHA256 prefix>@domain and verifies back to both", () => {
    process.env.REPLY_SECRET = "test-secret";
    const now = Date.UTC(2026, 11, 2);
    const day = (Date.UTC(2026, 11, 2) / 86_400_000 + 180).toString(16);
    const mac = createHmac("sha256", "test-secret")
      .update(`ticket-reply:${hex(ID)}:${hex(USER)}:until:${day}`)
      .digest("hex")
      .slice(0, 32);
    expect(replyAddress({ ticketId: ID, userId: USER, now })).toBe(`reply+${hex(ID)}.${hex(USER)}.${day}.${mac}@swarfbook.localhost`);
    const upper = replyAddress({ ticketId: ID, userId: USER }).toUpperCase().replace("SWARFBOOK.LOCALHOST", "swarfbook.localhost");
    expect(verifyReplyAddress(upper)).toEqual({ ticketId: ID, userId: USER });
  });

  it("expires after REPLY_ADDRESS_DAYS; the expiry cannot be pushed out; addresses mailed without one still verify", () => {
    process.env.REPLY_SECRET = "test-secret";
    process.env.REPLY_ADDRESS_DAYS = "30";
    const now = Date.UTC(2026, 11, 2);
    const address = replyAddress({ ticketId: ID, userId: USER, now });
    expect(verifyReplyAddress(address, now + 30 * 86_400_000)).toEqual({ ticketId: ID, userId: USER });
    expect(verifyReplyAddress(address, now + 31 * 86_400_000)).toBeNull();
    const day = (now / 86_400_000 + 30).toString(16);
    expect(verifyReplyAddress(address.replace(`.${day}.`, `.${(now / 86_400_000 + 999).toString(16)}.`), now + 31 * 86_400_000)).toBeNull();
    const legacyMac = createHmac("sha256", "test-secret")
      .update(`ticket-reply:${hex(ID)}:${hex(USER)}`)
      .digest("hex")
      .slice(0, 32);
    expect(verifyReplyAddress(`reply+${hex(ID)}.${hex(USER)}.${legacyMac}@swarfbook.localhost`)).toEqual({ ticketId: ID, userId: USER });
  });

  it("rejects another secret, another ticket or recipient, another domain and unsigned forms", () => {
    process.env.REPLY_SECRET = "one";
    const address = replyAddress({ ticketId: ID, userId: USER });
    process.env.REPLY_SECRET = "two";
    expect(verifyReplyAddress(address)).toBeNull();
    process.env.REPLY_SECRET = "one";
    expect(verifyReplyAddress(address.replace(hex(ID), hex("0b8a4b52-3c1f-4c7e-9d51-6a1e2f3b4c5e")))).toBeNull();
    // A recipient id swapped for another person's: the signature no longer holds.
    expect(verifyReplyAddress(address.replace(hex(USER), hex("7f1c2d3e-4b5a-4c6d-8e9f-0a1b2c3d4e50")))).toBeNull();
    expect(verifyReplyAddress(address.replace("swarfbook.localhost", "evil.test"))).toBeNull();
    expect(verifyReplyAddress(`reply+${ID}@swarfbook.localhost`)).toBeNull();
    // The earlier form, bound to the ticket only, is not accepted any more.
    const oldMac = createHmac("sha256", "one").update(`ticket-reply:${ID}`).digest("hex").slice(0, 32);
    expect(verifyReplyAddress(`reply+${ID}.${oldMac}@swarfbook.localhost`)).toBeNull();
    expect(verifyReplyAddress("support@swarfbook.localhost")).toBeNull();
  });
});

describe("Authentication-Results", () => {
  it("finds a failed SPF, DKIM or DMARC check and ignores comments and passes", () => {
    expect(failedAuthentication([" mx.example.net; spf=pass smtp.mailfrom=a@b.test; dkim=pass header.d=b.test; dmarc=pass"])).toBeNull();
    expect(failedAuthentication([" mx.example.net; spf=pass; dmarc=fail (p=reject) header.from=b.test"])).toBe("dmarc=fail");
    expect(failedAuthentication([' mx.example.net; dkim=fail reason="bad signature"'])).toBe("dkim=fail");
    expect(failedAuthentication([" mx.example.net;\r\n\tspf=FAIL smtp.mailfrom=x@y.test"])).toBe("spf=fail");
    expect(failedAuthentication([" mx.example.net; spf=pass (not dkim=fail at all)"])).toBeNull();
    expect(failedAuthentication([" mx.example.net; spf=softfail; dkim=none"])).toBeNull();
    expect(failedAuthentication([])).toBeNull();
  });
});

describe("stripQuotedText", () => {
  it("keeps the new text above an attribution line and quoted lines", () => {
    expect(stripQuotedText("Thanks, works now.\r\n\r\nOn Tue, 1 Dec 2026 at 10:00, Support <s@x> wrote:\r\n> old text\r\n")).toBe(
      "Thanks, works now.",
    );
  });
  it("stops at the reply marker, a signature and a forwarded header block", () => {
    expect(stripQuotedText("New\n-- Reply above this line to add to the ticket --\nold")).toBe("New");
    expect(stripQuotedText("New\n-- \nRiley")).toBe("New");
    expect(stripQuotedText("New\n\nFrom: Support\nSent: Tuesday\nold")).toBe("New");
  });
  it("handles an attribution wrapped over two lines", () => {
    expect(stripQuotedText("Yes\n\nOn Tue, 1 Dec 2026, Support <s@x>\nwrote:\n> q")).toBe("Yes");
  });
});

describe("senderAuthenticated", () => {
  const from = "buyer@shop.example.test";
  it("accepts a DKIM pass aligned with the From domain or a DMARC pass for it, from the receiving server only", () => {
    expect(senderAuthenticated([" mx.test; dkim=pass header.d=shop.example.test"], from, "")).toBe(true);
    expect(senderAuthenticated([" mx.test; dkim=pass (good) header.d=example.test header.s=s1"], from, "")).toBe(true);
    expect(senderAuthenticated([" mx.test; dkim=pass header.i=@shop.example.test"], from, "")).toBe(true);
    expect(senderAuthenticated([" mx.test; dmarc=pass header.from=shop.example.test"], from, "")).toBe(true);
    expect(senderAuthenticated([" mx.test; dkim=pass header.d=other.test"], from, "")).toBe(false);
    expect(senderAuthenticated([" mx.test; dkim=pass header.d=test"], from, "")).toBe(false);
    expect(senderAuthenticated([" mx.test; spf=pass smtp.mailfrom=shop.example.test"], from, "")).toBe(false);
    expect(senderAuthenticated([" mx.test; dkim=fail header.d=shop.example.test"], from, "")).toBe(false);
    expect(senderAuthenticated([" mx.test; spf=pass (dkim=pass header.d=shop.example.test)"], from, "")).toBe(false);
    expect(senderAuthenticated([], from, "")).toBe(false);
    // Only the topmost header is the receiving server's, unless its authserv-id is configured.
    expect(senderAuthenticated([" mx.test; dkim=none", " mx.test; dkim=pass header.d=shop.example.test"], from, "")).toBe(false);
    expect(senderAuthenticated([" forged.test; dkim=pass header.d=shop.example.test"], from, "mx.swarfbook.test")).toBe(false);
    expect(senderAuthenticated([" other; dkim=none", " mx.swarfbook.test; dmarc=pass"], from, "mx.swarfbook.test")).toBe(true);
  });
});
