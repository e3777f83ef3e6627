import nodemailer from "nodemailer";
import type { SMTPServer } from "smtp-server";
import { mkdtemp } from "node:fs/promises";
import os from "node:os";
import path from "node:path";

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
  process.env.STORAGE_DIR = await mkdtemp(path.join(os.tmpdir(), "sbk-inbound-"));
  server = await startInboundSmtp({ port });
});
afterAll(async () => {
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
      to: replyAddress(ticket.id),
      subject: "Re: [Vendor #1] Chips weld in the slot",
      attachments: [
        { filename: "slot.nc", content: "G21\nG1 X10 F1600\n" },
        { filename: "page.nc", content: "<html><script>x</script></html>" },
      ],
      text: "Raised the feed, the chips are clean now.\n\nOn Tue, 1 Dec 2026 at 10:00, Support wrote:\n> -- Reply above this line to add to the ticket --\n> Try 1800 mm/min\n",
    });
    const { messages, attachments } = await thread(vendor.id, ticket.id);
    expect(messages.map((m) => [m.body, m.source, m.authorId])).toEqual([["Raised the feed, the chips are clean now.", "email", customer.user.id]]);
    // The G-code file is kept (sniffed as text); the HTML file is refused like any upload.
    expect(attachments.map((a) => [a.fileName, a.kind, a.messageId])).toEqual([["slot.nc", "text", messages[0].id]]);
    const log = await db("inbound_mail_log").where({ ticket_id: ticket.id }).first();
    expect(log).toMatchObject({ outcome: "accepted", vendor_id: vendor.id });
  });

  it("drops and logs a forged signature and an unsigned address", async () => {
    const { vendor, customer } = await createVendorWithStaff();
    const ticket = await openTicket(vendor.id, customer.user.id);
    const genuine = replyAddress(ticket.id);
    const forged = genuine.replace(/\.([0-9a-f])/, (_m, c: string) => `.${c === "0" ? "1" : "0"}`);
    expect(verifyReplyAddress(forged)).toBeNull();
    const results = await handleInboundMail({ rcptTo: [forged, `reply+${ticket.id}@swarfbook.localhost`], from: customer.user.email, text: "Hello" });
    expect(results.map((r) => r.outcome)).toEqual(["dropped", "dropped"]);
    expect((await thread(vendor.id, ticket.id)).messages).toEqual([]);
    const logged = await db("inbound_mail_log").whereIn("rcpt_to", [forged, `reply+${ticket.id}@swarfbook.localhost`]).select("outcome", "reason");
    expect(logged).toHaveLength(2);
    expect(logged.every((l) => l.outcome === "dropped" && /unsigned or forged/.test(l.reason))).toBe(true);
  });

  it("drops a genuine address written from someone who is not a participant", async () => {
    const { vendor, customer } = await createVendorWithStaff();
    const stranger = await createMember(vendor.id, "customer");
    const ticket = await openTicket(vendor.id, customer.user.id);
    const [result] = await handleInboundMail({ rcptTo: [replyAddress(ticket.id)], from: stranger.user.email, text: "Let me in" });
    expect(result).toMatchObject({ outcome: "dropped", reason: "sender is not a participant of the ticket" });
    expect((await thread(vendor.id, ticket.id)).messages).toEqual([]);
  });

  it("a support agent answering by mail adds a public reply", async () => {
    const { vendor, customer, support } = await createVendorWithStaff();
    const ticket = await openTicket(vendor.id, customer.user.id);
    const [result] = await handleInboundMail({ rcptTo: [replyAddress(ticket.id)], from: support.user.email.toUpperCase(), text: "Use a ramp entry." });
    expect(result.outcome).toBe("accepted");
    const t = await thread(vendor.id, ticket.id);
    expect(t.messages.map((m) => [m.visibility, m.authorId])).toEqual([["public", support.user.id]]);
    expect(t.ticket.status).toBe("answered");
  });
});
