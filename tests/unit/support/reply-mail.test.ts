import { describe, expect, it } from "vitest";

import { renderReplyMail, REPLY_ABOVE } from "@/lib/tickets/notify/reply-mail";

describe("renderReplyMail", () => {
  const mail = renderReplyMail({
    intro: "Sam <support> replied to your ticket #7:",
    body: "Set **18,000 rpm**.\n\n1. rough\n2. finish",
    note: "The reply includes a sheet adapted to your machine: open the ticket to see it.",
    linkLabel: "See the whole thread",
    link: "https://portal.example/northbeck/support/tickets/1?a=1&b=2",
  });

  it("keeps the reply-above marker first in both parts", () => {
    expect(mail.text.startsWith(`${REPLY_ABOVE}\n`)).toBe(true);
    expect(mail.html).toContain(REPLY_ABOVE);
  });

  it("formats the reply in HTML and drops the marks from the text", () => {
    expect(mail.html).toContain("<strong>18,000 rpm</strong>");
    expect(mail.html).toContain("<ol>");
    expect(mail.text).toContain("Set 18,000 rpm.\n\n1. rough\n2. finish");
    expect(mail.text).not.toContain("**");
  });

  it("escapes the surrounding text and the link", () => {
    expect(mail.html).toContain("Sam &#60;support&#62; replied");
    expect(mail.html).toContain('href="https://portal.example/northbeck/support/tickets/1?a=1&#38;b=2"');
    expect(mail.text).toContain("See the whole thread: https://portal.example/northbeck/support/tickets/1?a=1&b=2");
  });
});
