import { createHmac } from "node:crypto";

import { afterEach, describe, expect, it } from "vitest";

import { replyAddress, verifyReplyAddress } from "@/lib/inbound-mail/reply-address";
import { stripQuotedText } from "@/lib/inbound-mail/strip-quoted";

const ID = "0b8a4b52-3c1f-4c7e-9d51-6a1e2f3b4c5d";

afterEach(() => {
  delete process.env.REPLY_SECRET;
  delete process.env.INBOUND_MAIL_DOMAIN;
});

describe("signed reply addresses", () => {
  it("is reply+<ticket>.<HMAC-SHA256 prefix>@domain and verifies back to the ticket", () => {
    process.env.REPLY_SECRET = "test-secret";
    const mac = createHmac("sha256", "test-secret").update(`ticket-reply:${ID}`).digest("hex").slice(0, 32);
    expect(replyAddress(ID)).toBe(`reply+${ID}.${mac}@swarfbook.localhost`);
    expect(verifyReplyAddress(replyAddress(ID).toUpperCase().replace("SWARFBOOK.LOCALHOST", "swarfbook.localhost"))).toBe(ID);
  });

  it("rejects another secret, another ticket id, another domain and unsigned forms", () => {
    process.env.REPLY_SECRET = "one";
    const address = replyAddress(ID);
    process.env.REPLY_SECRET = "two";
    expect(verifyReplyAddress(address)).toBeNull();
    process.env.REPLY_SECRET = "one";
    expect(verifyReplyAddress(address.replace(ID, "0b8a4b52-3c1f-4c7e-9d51-6a1e2f3b4c5e"))).toBeNull();
    expect(verifyReplyAddress(address.replace("swarfbook.localhost", "evil.test"))).toBeNull();
    expect(verifyReplyAddress(`reply+${ID}@swarfbook.localhost`)).toBeNull();
    expect(verifyReplyAddress("support@swarfbook.localhost")).toBeNull();
  });
});

describe("stripQuotedText", () => {
  it("keeps the new text above an attribution line and quoted lines", () => {
    expect(stripQuotedText("Thanks, works now.\r\n\r\nOn Tue, 1 Dec 2026 at 10:00, Support <s@x> wrote:\r\n> old text\r\n")).toBe("Thanks, works now.");
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
