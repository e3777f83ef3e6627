import { describe, expect, it } from "vitest";

import { db } from "@/lib/db/knex";
import { verifyReplyAddress } from "@/lib/inbound-mail/reply-address";
import { addCustomerMessage, addStaffMessage } from "@/lib/tickets/add-message";
import { updateTicket } from "@/lib/tickets/update-ticket";
import { createVendorWithStaff } from "@/tests/factories/foundation";
import { loadVendor, openTicket } from "@/tests/factories/tickets";

type Queued = { to: string; subject: string; text: string; html?: string; replyTo?: string };
const mailsTo = async (to: string): Promise<Queued[]> =>
  (await db.raw("select data from pgboss.job where name = 'mail.send' and data->>'to' = ? order by created_on", [to])).rows.map(
    (r: { data: Queued }) => r.data,
  );

describe("ticket e-mail", () => {
  it("team hears of new tickets, customers of staff replies (never notes), assignees of customer replies", async () => {
    const { vendor: v, support, admin, customer } = await createVendorWithStaff();
    const vendor = await loadVendor(v.id);
    const ticket = await openTicket(v.id, customer.user.id, { subject: "Broken tool on entry" });
    expect((await mailsTo(support.user.email)).map((m) => m.subject)).toEqual([expect.stringMatching(/New ticket: Broken tool on entry/)]);
    // Admins are only the fallback when the vendor has support staff.
    expect(await mailsTo(admin.user.email)).toEqual([]);

    await addStaffMessage({
      vendorId: v.id,
      ticketId: ticket.id,
      authorId: support.user.id,
      body: "Secret internal remark",
      visibility: "note",
    });
    expect(await mailsTo(customer.user.email)).toEqual([]);
    await addStaffMessage({
      vendorId: v.id,
      ticketId: ticket.id,
      authorId: support.user.id,
      body: "Use a helical entry.",
      visibility: "public",
    });
    const [reply] = await mailsTo(customer.user.email);
    expect(reply.text).toContain("Use a helical entry.");
    expect(reply.text).not.toContain("Secret internal remark");
    expect(verifyReplyAddress(reply.replyTo ?? "")).toEqual({ ticketId: ticket.id, userId: customer.user.id });

    await updateTicket({ vendor, actorUserId: support.user.id, input: { ticketId: ticket.id, assigneeId: admin.user.id } });
    await addCustomerMessage({ vendorId: v.id, ticketId: ticket.id, authorId: customer.user.id, body: "Helix worked." });
    const adminMails = await mailsTo(admin.user.email);
    expect(adminMails.map((m) => m.subject)).toEqual([expect.stringMatching(/Customer reply: Broken tool on entry/)]);
    expect(adminMails[0].text).toContain("Helix worked.");
  });

  it("sends a reply's Markdown formatted, with a plain-text part free of marks, and never its raw HTML", async () => {
    const { vendor: v, support, customer } = await createVendorWithStaff();
    const ticket = await openTicket(v.id, customer.user.id, { subject: "Chatter on the finish pass" });
    const body =
      "Try **18,000 rpm** and _climb_ milling:\n\n- ae 0.5 mm\n- [the sheet](https://example.com/s)\n\n<script>alert(1)</script>\n\n[x](javascript:alert(1))";
    await addStaffMessage({ vendorId: v.id, ticketId: ticket.id, authorId: support.user.id, body, visibility: "public" });
    const [reply] = await mailsTo(customer.user.email);
    expect(reply.html).toContain("<strong>18,000 rpm</strong>");
    expect(reply.html).toContain('<a href="https://example.com/s">the sheet</a>');
    expect(reply.html).not.toMatch(/<script|javascript:/);
    expect(reply.html).toContain("&#x3C;script>");
    expect(reply.text).toContain("Try 18,000 rpm and climb milling:");
    expect(reply.text).toContain("- the sheet (https://example.com/s)");
    expect(reply.text).not.toContain("**");
  });
});
