import { describe, expect, it } from "vitest";

import { db } from "@/lib/db/knex";
import { addCustomerMessage, addStaffMessage } from "@/lib/tickets/add-message";
import { getTicketThread } from "@/lib/tickets/get-ticket-thread";
import { rateTicket } from "@/lib/tickets/rate-ticket";
import { updateTicket } from "@/lib/tickets/update-ticket";
import { createMember, createVendorWithStaff } from "@/tests/factories/foundation";
import { loadVendor, openTicket } from "@/tests/factories/tickets";
import { mustExist } from "@/tests/support/must-exist";

describe("replies", () => {
  it("two agents replying at the same moment both land", async () => {
    const { vendor, support, admin, customer } = await createVendorWithStaff();
    const ticket = await openTicket(vendor.id, customer.user.id);
    await Promise.all([
      addStaffMessage({ vendorId: vendor.id, ticketId: ticket.id, authorId: support.user.id, body: "Reply A", visibility: "public" }),
      addStaffMessage({ vendorId: vendor.id, ticketId: ticket.id, authorId: admin.user.id, body: "Reply B", visibility: "public" }),
    ]);
    const thread = await getTicketThread({
      vendorId: vendor.id,
      ticketId: ticket.id,
      viewer: { kind: "customer", userId: customer.user.id },
    });
    expect(thread.messages.map((m) => m.body).sort()).toEqual(["Reply A", "Reply B"]);
    expect(thread.ticket.status).toBe("answered");
    expect(thread.ticket.firstResponseAt).not.toBeNull();
  });

  it("a customer reply puts an answered ticket back in progress; a customer cannot write on another's ticket", async () => {
    const { vendor, support, customer } = await createVendorWithStaff();
    const stranger = await createMember(vendor.id, "customer");
    const ticket = await openTicket(vendor.id, customer.user.id);
    await addStaffMessage({
      vendorId: vendor.id,
      ticketId: ticket.id,
      authorId: support.user.id,
      body: "Try 1800 mm/min",
      visibility: "public",
    });
    await addCustomerMessage({ vendorId: vendor.id, ticketId: ticket.id, authorId: customer.user.id, body: "Still melts" });
    const { ticket: t } = await getTicketThread({ vendorId: vendor.id, ticketId: ticket.id, viewer: { kind: "staff" } });
    expect(t.status).toBe("in_progress");
    await expect(
      addCustomerMessage({ vendorId: vendor.id, ticketId: ticket.id, authorId: stranger.user.id, body: "x" }),
    ).rejects.toMatchObject({ code: "not_found" });
  });
});

describe("audit trail", () => {
  it("records every status, priority and assignee change with who and from/to", async () => {
    const { vendor: v, support, customer } = await createVendorWithStaff();
    const vendor = await loadVendor(v.id);
    const ticket = await openTicket(v.id, customer.user.id);
    await updateTicket({
      vendor,
      actorUserId: support.user.id,
      input: { ticketId: ticket.id, status: "in_progress", priority: "urgent", assigneeId: support.user.id },
    });
    await updateTicket({ vendor, actorUserId: support.user.id, input: { ticketId: ticket.id, status: "in_progress" } });
    const rows = await db("audit_log").where({ vendor_id: v.id, object_id: ticket.id }).whereNot("action", "ticket.create").orderBy("id");
    expect(rows.map((r) => [r.action, r.actor_user_id, r.details])).toEqual([
      ["ticket.status", support.user.id, { from: "new", to: "in_progress" }],
      ["ticket.priority", support.user.id, { from: "normal", to: "urgent" }],
      ["ticket.assignee", support.user.id, { from: null, to: support.user.id }],
    ]);
    expect(rows.every((r) => r.created_at instanceof Date)).toBe(true);
  });

  it("a priority change before the first reply moves the target (urgent: 2 h by default)", async () => {
    const { vendor: v, support, customer } = await createVendorWithStaff();
    const vendor = await loadVendor(v.id);
    const ticket = await openTicket(v.id, customer.user.id);
    await updateTicket({ vendor, actorUserId: support.user.id, input: { ticketId: ticket.id, priority: "urgent" } });
    const row = mustExist(await db("tickets").where({ id: ticket.id }).first(), "row");
    expect((row.first_response_due_at.getTime() - row.created_at.getTime()) / 3_600_000).toBeCloseTo(2, 6);
  });

  it("refuses to assign a ticket to a customer", async () => {
    const { vendor: v, support, customer } = await createVendorWithStaff();
    const vendor = await loadVendor(v.id);
    const ticket = await openTicket(v.id, customer.user.id);
    await expect(
      updateTicket({ vendor, actorUserId: support.user.id, input: { ticketId: ticket.id, assigneeId: customer.user.id } }),
    ).rejects.toMatchObject({ code: "invalid_input" });
  });
});

describe("satisfaction", () => {
  it("the customer rates a closed ticket 1–5, not an open one", async () => {
    const { vendor: v, support, customer } = await createVendorWithStaff();
    const vendor = await loadVendor(v.id);
    const ticket = await openTicket(v.id, customer.user.id);
    await expect(
      rateTicket({ vendorId: v.id, customerId: customer.user.id, input: { ticketId: ticket.id, satisfaction: 5, comment: "" } }),
    ).rejects.toMatchObject({ code: "conflict" });
    await updateTicket({ vendor, actorUserId: support.user.id, input: { ticketId: ticket.id, status: "closed" } });
    await rateTicket({
      vendorId: v.id,
      customerId: customer.user.id,
      input: { ticketId: ticket.id, satisfaction: 4, comment: "Quick and right" },
    });
    const row = mustExist(await db("tickets").where({ id: ticket.id }).first(), "row");
    expect([row.satisfaction, row.satisfaction_comment, row.closed_at instanceof Date]).toEqual([4, "Quick and right", true]);
  });
});
