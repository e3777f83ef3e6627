import { describe, expect, it } from "vitest";

import { listQueue } from "@/lib/desk/list-queue";
import { getTicketThread } from "@/lib/tickets/get-ticket-thread";
import { listCustomerTickets } from "@/lib/tickets/list-customer-tickets";
import { createMember, createVendorWithStaff } from "@/tests/factories/foundation";
import { openTicket } from "@/tests/factories/tickets";

describe("ticket isolation", () => {
  it("a customer reads only their own tickets", async () => {
    const { vendor, customer } = await createVendorWithStaff();
    const other = await createMember(vendor.id, "customer");
    const mine = await openTicket(vendor.id, customer.user.id, { subject: "Mine" });
    const theirs = await openTicket(vendor.id, other.user.id, { subject: "Theirs" });
    const list = await listCustomerTickets({ vendorId: vendor.id, customerId: customer.user.id });
    expect(list.map((t) => t.id)).toEqual([mine.id]);
    await expect(
      getTicketThread({ vendorId: vendor.id, ticketId: theirs.id, viewer: { kind: "customer", userId: customer.user.id } }),
    ).rejects.toMatchObject({ code: "not_found" });
  });

  it("another vendor's ticket is not found, even for staff", async () => {
    const a = await createVendorWithStaff();
    const b = await createVendorWithStaff();
    const ticket = await openTicket(a.vendor.id, a.customer.user.id);
    await expect(getTicketThread({ vendorId: b.vendor.id, ticketId: ticket.id, viewer: { kind: "staff" } })).rejects.toMatchObject({
      code: "not_found",
    });
    const queue = await listQueue({ vendorId: b.vendor.id, userId: b.support.user.id, filters: {} });
    expect(queue.find((t) => t.id === ticket.id)).toBeUndefined();
    const ownQueue = await listQueue({ vendorId: a.vendor.id, userId: a.support.user.id, filters: {} });
    expect(ownQueue.map((t) => t.id)).toContain(ticket.id);
  });

  it("numbers tickets per vendor from 1", async () => {
    const a = await createVendorWithStaff();
    const b = await createVendorWithStaff();
    const first = await openTicket(a.vendor.id, a.customer.user.id);
    const second = await openTicket(a.vendor.id, a.customer.user.id);
    const otherVendor = await openTicket(b.vendor.id, b.customer.user.id);
    expect([first.number, second.number, otherVendor.number]).toEqual([1, 2, 1]);
  });
});
