import { describe, expect, it } from "vitest";

import { db } from "@/lib/db/knex";
import { updateTicket } from "@/lib/tickets/update-ticket";
import { createVendorWithStaff } from "@/tests/factories/foundation";
import { loadVendor, openTicket } from "@/tests/factories/tickets";

describe("ticket panel saves", () => {
  it("answers with the saved values and leaves fields it was not sent alone", async () => {
    const { vendor: v, support, customer } = await createVendorWithStaff();
    const vendor = await loadVendor(v.id);
    const ticket = await openTicket(v.id, customer.user.id);
    const saved = await updateTicket({
      vendor,
      actorUserId: support.user.id,
      input: { ticketId: ticket.id, priority: "high", expected: { priority: "normal" } },
    });
    expect(saved).toMatchObject({ priority: "high", status: "new" });
    await updateTicket({ vendor, actorUserId: support.user.id, input: { ticketId: ticket.id, tags: ["acrylic"], expected: { tags: "" } } });
    const row = await db("tickets").where({ id: ticket.id }).first("priority", "tags");
    expect(row).toEqual({ priority: "high", tags: ["acrylic"] });
    const priorityAudits = await db("audit_log")
      .where({ object_id: ticket.id, action: "ticket.priority" })
      .count<{ count: string }[]>("* as count");
    expect(Number(priorityAudits[0].count)).toBe(1);
  });

  it("refuses a change to a field someone else changed meanwhile, with a clear message", async () => {
    const { vendor: v, support, admin, customer } = await createVendorWithStaff();
    const vendor = await loadVendor(v.id);
    const ticket = await openTicket(v.id, customer.user.id);
    await updateTicket({
      vendor,
      actorUserId: admin.user.id,
      input: { ticketId: ticket.id, priority: "urgent", expected: { priority: "normal" } },
    });
    await expect(
      updateTicket({
        vendor,
        actorUserId: support.user.id,
        input: { ticketId: ticket.id, priority: "low", expected: { priority: "normal" } },
      }),
    ).rejects.toMatchObject({
      code: "conflict",
      message: expect.stringContaining("Someone else changed the priority"),
      details: { current: expect.objectContaining({ priority: "urgent" }) },
    });
    expect((await db("tickets").where({ id: ticket.id }).first("priority"))?.priority).toBe("urgent");
  });
});
