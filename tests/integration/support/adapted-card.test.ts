import { describe, expect, it } from "vitest";

import { addStaffMessage } from "@/lib/tickets/add-message";
import { buildCard } from "@/lib/tickets/build-card";
import { getTicketThread } from "@/lib/tickets/get-ticket-thread";
import { createVendorWithStaff } from "@/tests/factories/foundation";
import { createMachine, createPublishedSheet, openTicket } from "@/tests/factories/tickets";

describe("a reply with an adapted sheet", () => {
  it("computes the sheet on the customer's machine and stores it with the message", async () => {
    const { vendor, customer, support } = await createVendorWithStaff();
    const sheet = await createPublishedSheet(vendor.id);
    // Sheet slot: n 18000 rpm, vf 1800 mm/min, 1 flute → fz = vf/(z·n) = 0.1 mm. Machine tops out at 16 000 rpm.
    const machine = await createMachine(vendor.id, customer.user.id, { rpm_max: 16000, max_feed_mm_min: 3000 });
    const ticket = await openTicket(vendor.id, customer.user.id);
    const card = await buildCard({
      vendorId: vendor.id,
      sheetVersionId: sheet.versionId,
      machineId: machine.id,
      customerId: customer.user.id,
    });
    const slot = card.operations[0];
    expect(slot.reference).toMatchObject({ rpm: 18000, feedMmMin: 1800 });
    expect(slot.adapted?.rpm).toBe(16000);
    // vf = fz·z·n = 0.1 · 1 · 16000 = 1600 mm/min (ISO 3002-1 / Machinery's Handbook).
    expect(slot.adapted?.feedMmMin).toBeCloseTo(1600, 6);
    expect(slot.steps.map((s) => s.rule)).toContain("spindle-speed-range");
    expect(slot.warnings.map((w) => w.code)).toContain("standard-cautions");

    await addStaffMessage({
      vendorId: vendor.id,
      ticketId: ticket.id,
      authorId: support.user.id,
      body: "Here is the sheet for your router.",
      visibility: "public",
      card,
    });
    const thread = await getTicketThread({
      vendorId: vendor.id,
      ticketId: ticket.id,
      viewer: { kind: "customer", userId: customer.user.id },
    });
    expect(thread.messages[0].card?.operations[0].adapted?.rpm).toBe(16000);
    expect(thread.links.map((l) => [l.sheetVersionId, l.machineId])).toEqual([[sheet.versionId, machine.id]]);
  });

  it("refuses a machine that is not the customer's", async () => {
    const { vendor, customer, support } = await createVendorWithStaff();
    const sheet = await createPublishedSheet(vendor.id);
    const machine = await createMachine(vendor.id, support.user.id);
    await expect(
      buildCard({ vendorId: vendor.id, sheetVersionId: sheet.versionId, machineId: machine.id, customerId: customer.user.id }),
    ).rejects.toMatchObject({ code: "invalid_input" });
  });
});
