import { mkdtemp } from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import nodemailer from "nodemailer";
import type { SMTPServer } from "smtp-server";
import { afterAll, beforeAll, describe, expect, it } from "vitest";

import { db } from "@/lib/db/knex";
import { handleInboundMail } from "@/lib/inbound-mail/handle-inbound-mail";
import { replyAddress, verifyReplyAddress } from "@/lib/inbound-mail/reply-address";
import { startInboundSmtp } from "@/lib/inbound-mail/start-inbound-smtp";
import { getTicketThread } from "@/lib/tickets/get-ticket-thread";
import { createMember, createVendorWithStaff } from "@/tests/factories/foundation";
import { openTicket } from "@/tests/factories/tickets";

const port = 2600 + Math.floor(Math.random() * 300);
let server: SMTPServer;

beforeAll(async () => {
  // These mails carry no Authentication-Results header; the requirement itself is tested at the end.
  process.env.INBOUND_MAIL_REQUIRE_AUTH = "off";
  process.env.STORAGE_DIR = await mkdtemp(path.join(os.tmpdir(), "sbk-inbound-"));
  server = await startInboundSmtp({ port });
});
afterAll(async () => {
  delete process.env.INBOUND_MAIL_REQUIRE_AUTH;
  await new Promise<void>((resolve) => server.close(() => resolve()));
});

const thread = (vendorId: string, ticketId: string) => getTicketThread({ vendorId, ticketId, viewer: { kind: "staff" } });

describe("reply by e-mail", () => {
  it("a reply to the signed address, sent over SMTP, becomes a thread message without the quoted text", async () => {
    const { vendor, customer } = await createVendorWithStaff();
    const ticket = await openTicket(vendor.id, customer.user.id);
    const transport = nodemailer.createTransport({ host: "127.0.0.1", port, secure: false, ignoreTLS: true });
    await transport.sendMail({
      from: customer.user.email,
      to: replyAddress({ ticketId: ticket.id, userId: customer.user.id }),
      subject: "Re: [Vendor #1] Chips weld in the slot",
      attachments: [
        { filename: "slot.nc", content: "G21\nG1 X10 F1600\n" },
        { filename: "page.nc", content: "<html><script>x</script></html>" },
      ],
      text: "Raised the feed, the chips are clean now.\n\nOn Tue, 1 Dec 2026 at 10:00, Support wrote:\n> -- Reply above this line to add to the ticket --\n> Try 1800 mm/min\n",
    });
    const { messages, attachments } = await thread(vendor.id, ticket.id);
    expect(messages.map((m) => [m.body, m.source, m.authorId])).toEqual([
      ["Raised the feed, the chips are clean now.", "email", customer.user.id],
    ]);
    // The G-code file is kept (sniffed as text); the HTML file is refused like any upload.
    expect(attachments.map((a) => [a.fileName, a.kind, a.messageId])).toEqual([["slot.nc", "text", messages[0].id]]);
    const log = await db("inbound_mail_log").where({ ticket_id: ticket.id }).first();
    expect(log).toMatchObject({ outcome: "accepted", vendor_id: vendor.id });
  });

  it("drops and logs a forged signature and an unsigned address", async () => {
    const { vendor, customer } = await createVendorWithStaff();
    const ticket = await openTicket(vendor.id, customer.user.id);
    const genuine = replyAddress({ ticketId: ticket.id, userId: customer.user.id });
    const forged = genuine.replace(/\.([0-9a-f])/, (_m, c: string) => `.${c === "0" ? "1" : "0"}`);
    expect(verifyReplyAddress(forged)).toBeNull();
    const results = await handleInboundMail({
      rcptTo: [forged, `reply+${ticket.id}@swarfbook.localhost`],
      from: customer.user.email,
      text: "Hello",
    });
    expect(results.map((r) => r.outcome)).toEqual(["dropped", "dropped"]);
    expect((await thread(vendor.id, ticket.id)).messages).toEqual([]);
    const logged = await db("inbound_mail_log")
      .whereIn("rcpt_to", [forged, `reply+${ticket.id}@swarfbook.localhost`])
      .select("outcome", "reason");
    expect(logged).toHaveLength(2);
    expect(logged.every((l) => l.outcome === "dropped" && /unsigned or forged/.test(l.reason))).toBe(true);
  });

  it("drops a genuine address written from someone other than its recipient", async () => {
    const { vendor, customer } = await createVendorWithStaff();
    const stranger = await createMember(vendor.id, "customer");
    const ticket = await openTicket(vendor.id, customer.user.id);
    const [result] = await handleInboundMail({
      rcptTo: [replyAddress({ ticketId: ticket.id, userId: customer.user.id })],
      from: stranger.user.email,
      text: "Let me in",
    });
    expect(result).toMatchObject({ outcome: "dropped", reason: "From is not the person the reply address was sent to" });
    expect((await thread(vendor.id, ticket.id)).messages).toEqual([]);
  });

  it("a support agent answering by mail adds a public reply", async () => {
    const { vendor, customer, support } = await createVendorWithStaff();
    const ticket = await openTicket(vendor.id, customer.user.id);
    const [result] = await handleInboundMail({
      rcptTo: [replyAddress({ ticketId: ticket.id, userId: support.user.id })],
      from: support.user.email.toUpperCase(),
      text: "Use a ramp entry.",
    });
    expect(result.outcome).toBe("accepted");
    const t = await thread(vendor.id, ticket.id);
    expect(t.messages.map((m) => [m.visibility, m.authorId])).toEqual([["public", support.user.id]]);
    expect(t.ticket.status).toBe("answered");
  });
});

describe("reply by e-mail: the address is bound to its recipient", () => {
  it("a customer writing From a staff address to their own reply address posts as the customer, never as staff", async () => {
    const { vendor, customer, support } = await createVendorWithStaff();
    const ticket = await openTicket(vendor.id, customer.user.id);
    const own = replyAddress({ ticketId: ticket.id, userId: customer.user.id });
    const [spoofed] = await handleInboundMail({ rcptTo: [own], from: support.user.email, text: "Resolved, nothing to see." });
    expect(spoofed).toMatchObject({ outcome: "dropped", reason: "From is not the person the reply address was sent to" });
    const t = await thread(vendor.id, ticket.id);
    expect(t.messages).toEqual([]);
    expect(t.ticket.status).not.toBe("answered");
  });

  it("someone a notification was forwarded to cannot post as its recipient", async () => {
    const { vendor, customer } = await createVendorWithStaff();
    const ticket = await openTicket(vendor.id, customer.user.id);
    const [result] = await handleInboundMail({
      rcptTo: [replyAddress({ ticketId: ticket.id, userId: customer.user.id })],
      from: "colleague@elsewhere.test",
      text: "I am not the customer",
    });
    expect(result.outcome).toBe("dropped");
    expect((await thread(vendor.id, ticket.id)).messages).toEqual([]);
  });

  it("a removed customer cannot post, and a staff member without Desk access cannot either", async () => {
    const { vendor, customer, support, engineer } = await createVendorWithStaff();
    const ticket = await openTicket(vendor.id, customer.user.id);
    const toSupport = replyAddress({ ticketId: ticket.id, userId: support.user.id });
    await db("members").where({ id: customer.memberId }).delete();
    const [removed] = await handleInboundMail({
      rcptTo: [replyAddress({ ticketId: ticket.id, userId: customer.user.id })],
      from: customer.user.email,
      text: "Still here",
    });
    expect(removed).toMatchObject({ outcome: "dropped", reason: "the person the address was sent to is no longer a member" });
    await db("members").where({ id: support.memberId }).update({ role: "engineer" });
    const [demoted] = await handleInboundMail({ rcptTo: [toSupport], from: support.user.email, text: "Answer" });
    expect(demoted).toMatchObject({ outcome: "dropped", reason: "the person the address was sent to has no access to the ticket" });
    const [engineerTry] = await handleInboundMail({
      rcptTo: [replyAddress({ ticketId: ticket.id, userId: engineer.user.id })],
      from: engineer.user.email,
      text: "Hi",
    });
    expect(engineerTry.outcome).toBe("dropped");
    expect((await thread(vendor.id, ticket.id)).messages).toEqual([]);
  });

  it("refuses mail whose receiving server recorded a failed DMARC, SPF or DKIM check", async () => {
    const { vendor, customer } = await createVendorWithStaff();
    const ticket = await openTicket(vendor.id, customer.user.id);
    const to = replyAddress({ ticketId: ticket.id, userId: customer.user.id });
    for (const verdict of [
      "dmarc=fail header.from=example.test",
      "spf=fail smtp.mailfrom=example.test",
      "dkim=fail header.d=example.test",
    ]) {
      const [result] = await handleInboundMail({
        rcptTo: [to],
        from: customer.user.email,
        text: "Hello",
        authenticationResults: [` mx.test; ${verdict}`],
      });
      expect(result.outcome).toBe("dropped");
      expect(result.reason).toMatch(/receiving server reports (dmarc|spf|dkim)=fail/);
    }
    const [passed] = await handleInboundMail({
      rcptTo: [to],
      from: customer.user.email,
      text: "Hello",
      authenticationResults: [" mx.test; spf=pass; dkim=pass; dmarc=pass"],
    });
    expect(passed.outcome).toBe("accepted");
  });

  it("over SMTP: the Authentication-Results header is read, and a retried delivery with one Message-ID posts once", async () => {
    const { vendor, customer } = await createVendorWithStaff();
    const ticket = await openTicket(vendor.id, customer.user.id);
    const transport = nodemailer.createTransport({ host: "127.0.0.1", port, secure: false, ignoreTLS: true });
    const to = replyAddress({ ticketId: ticket.id, userId: customer.user.id });
    await transport.sendMail({
      from: customer.user.email,
      to,
      subject: "Re",
      text: "Spoofed",
      headers: { "Authentication-Results": "mx.test; dmarc=fail header.from=example.test" },
    });
    const mail = { from: customer.user.email, to, subject: "Re", text: "Posted once", messageId: `<retry-${ticket.id}@mail.example.test>` };
    await transport.sendMail(mail);
    await transport.sendMail(mail);
    const [again] = await handleInboundMail({ rcptTo: [to], from: customer.user.email, text: "Posted once", messageId: mail.messageId });
    expect(again.outcome).toBe("duplicate");
    expect((await thread(vendor.id, ticket.id)).messages.map((m) => m.body)).toEqual(["Posted once"]);
    // Without a Message-ID, the same sender and text delivered twice also post once.
    await handleInboundMail({ rcptTo: [to], from: customer.user.email, text: "No id here" });
    await handleInboundMail({ rcptTo: [to], from: customer.user.email, text: "No id here" });
    expect((await thread(vendor.id, ticket.id)).messages.map((m) => m.body)).toEqual(["Posted once", "No id here"]);
  });

  it("answers 451 only before anything was stored; once stored, 250 even when a later step fails", async () => {
    const { vendor, customer } = await createVendorWithStaff();
    const ticket = await openTicket(vendor.id, customer.user.id);
    const transport = nodemailer.createTransport({ host: "127.0.0.1", port, secure: false, ignoreTLS: true });
    const to = replyAddress({ ticketId: ticket.id, userId: customer.user.id });
    // A later step fails: the log table refuses this ticket's entries after the message is stored. (Only this
    // ticket's rows, as other test files share the database.)
    await db.raw(`create or replace function refuse_inbound_log() returns trigger language plpgsql as $$
      begin if new.ticket_id = '${ticket.id}' then raise exception 'log down'; end if; return new; end $$`);
    await db.raw("create trigger refuse_inbound_log before insert on inbound_mail_log for each row execute function refuse_inbound_log()");
    try {
      const info = await transport.sendMail({
        from: customer.user.email,
        to,
        subject: "Re",
        text: "Stored despite the log",
        messageId: `<later-${ticket.id}@x.test>`,
      });
      expect(info.response).toMatch(/^250/);
      expect((await thread(vendor.id, ticket.id)).messages.map((m) => m.body)).toEqual(["Stored despite the log"]);
    } finally {
      await db.raw("drop trigger refuse_inbound_log on inbound_mail_log");
    }
    // Nothing stored (the message insert itself fails): 451, so the sender tries again.
    await db.raw(`create or replace function refuse_message() returns trigger language plpgsql as $$
      begin if new.ticket_id = '${ticket.id}' then raise exception 'db down'; end if; return new; end $$`);
    await db.raw("create trigger refuse_message before insert on ticket_messages for each row execute function refuse_message()");
    try {
      await expect(
        transport.sendMail({ from: customer.user.email, to, subject: "Re", text: "Not stored", messageId: `<early-${ticket.id}@x.test>` }),
      ).rejects.toMatchObject({ responseCode: 451 });
    } finally {
      await db.raw("drop trigger refuse_message on ticket_messages");
    }
    expect((await thread(vendor.id, ticket.id)).messages.map((m) => m.body)).toEqual(["Stored despite the log"]);
  });
});

describe("reply by e-mail with INBOUND_MAIL_REQUIRE_AUTH on", () => {
  it("a forged From is refused unless the receiving server vouches for the From domain", async () => {
    const { vendor, customer } = await createVendorWithStaff();
    const ticket = await openTicket(vendor.id, customer.user.id);
    const to = replyAddress({ ticketId: ticket.id, userId: customer.user.id });
    const domain = customer.user.email.split("@")[1];
    process.env.INBOUND_MAIL_REQUIRE_AUTH = "on";
    try {
      // No header, no verdict, or a pass for another domain: the From header alone is anyone's to write.
      const refused = [
        [],
        [" mx.test; spf=pass; dkim=none"],
        [` mx.test; dkim=pass header.d=attacker.test`],
        [` mx.test; dmarc=pass header.from=attacker.test`],
      ];
      for (const authenticationResults of refused) {
        const [result] = await handleInboundMail({ rcptTo: [to], from: customer.user.email, text: "Forged", authenticationResults });
        expect(result).toMatchObject({ outcome: "dropped" });
      }
      // A sender's own pass written below the receiving server's header is not believed.
      const [below] = await handleInboundMail({
        rcptTo: [to],
        from: customer.user.email,
        text: "Forged",
        authenticationResults: [" mx.test; dkim=none", ` mx.test; dkim=pass header.d=${domain}`],
      });
      expect(below).toMatchObject({ outcome: "dropped" });
      const [dkim] = await handleInboundMail({
        rcptTo: [to],
        from: customer.user.email,
        text: "Signed",
        messageId: "<a@signed>",
        authenticationResults: [` mx.test; spf=pass; dkim=pass header.d=${domain}`],
      });
      expect(dkim).toMatchObject({ outcome: "accepted" });
      const [dmarc] = await handleInboundMail({
        rcptTo: [to],
        from: customer.user.email,
        text: "Aligned",
        messageId: "<b@signed>",
        authenticationResults: [` mx.test; dmarc=pass header.from=${domain}`],
      });
      expect(dmarc).toMatchObject({ outcome: "accepted" });
      expect((await thread(vendor.id, ticket.id)).messages.map((m) => m.body)).not.toContain("Forged");
    } finally {
      process.env.INBOUND_MAIL_REQUIRE_AUTH = "off";
    }
  });
});
