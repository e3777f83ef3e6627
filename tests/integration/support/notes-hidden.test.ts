import { describe, expect, it } from "vitest";

import { addStaffMessage } from "@/lib/tickets/add-message";
import { getAttachment } from "@/lib/tickets/attachments/get-attachment";
import { saveAttachment } from "@/lib/tickets/attachments/save-attachment";
import { getTicketThread } from "@/lib/tickets/get-ticket-thread";
import { createVendorWithStaff } from "@/tests/factories/foundation";
import { openTicket } from "@/tests/factories/tickets";

const GCODE = Buffer.from("G21\nG1 X10 F1800\n");

describe("internal notes", () => {
  it("customers never see notes or files attached to notes; staff see both", async () => {
    const { vendor, support, customer } = await createVendorWithStaff();
    const ticket = await openTicket(vendor.id, customer.user.id);
    const file = await saveAttachment({ vendorId: vendor.id, userId: support.user.id, bytes: GCODE, fileName: "internal.nc" });
    await addStaffMessage({
      vendorId: vendor.id,
      ticketId: ticket.id,
      authorId: support.user.id,
      body: "Internal: the customer runs a worn cutter.",
      visibility: "note",
      attachmentIds: [file.id],
    });
    await addStaffMessage({
      vendorId: vendor.id,
      ticketId: ticket.id,
      authorId: support.user.id,
      body: "Raise the feed to 1800 mm/min.",
      visibility: "public",
    });

    const seen = await getTicketThread({
      vendorId: vendor.id,
      ticketId: ticket.id,
      viewer: { kind: "customer", userId: customer.user.id },
    });
    expect(seen.messages.map((m) => m.body)).toEqual(["Raise the feed to 1800 mm/min."]);
    expect(seen.attachments).toEqual([]);
    await expect(
      getAttachment({ vendorId: vendor.id, attachmentId: file.id, userId: customer.user.id, role: "customer" }),
    ).rejects.toMatchObject({ code: "not_found" });

    const staff = await getTicketThread({ vendorId: vendor.id, ticketId: ticket.id, viewer: { kind: "staff" } });
    expect(staff.messages.map((m) => m.visibility)).toEqual(["note", "public"]);
    expect(staff.attachments.map((a) => a.id)).toEqual([file.id]);
  });

  it("a note does not stop the first-response clock or change the status", async () => {
    const { vendor, support, customer } = await createVendorWithStaff();
    const ticket = await openTicket(vendor.id, customer.user.id);
    await addStaffMessage({
      vendorId: vendor.id,
      ticketId: ticket.id,
      authorId: support.user.id,
      body: "Looking into it",
      visibility: "note",
    });
    const { ticket: t } = await getTicketThread({ vendorId: vendor.id, ticketId: ticket.id, viewer: { kind: "staff" } });
    expect(t.status).toBe("new");
    expect(t.firstResponseAt).toBeNull();
  });
});
