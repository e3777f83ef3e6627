import { describe, expect, it } from "vitest";

import { db } from "@/lib/db/knex";
import { getDeskDashboard } from "@/lib/desk/dashboard-stats";
import { listQueue } from "@/lib/desk/list-queue";
import { listDeskViews, saveDeskView } from "@/lib/desk/saved-views";
import { addStaffMessage } from "@/lib/tickets/add-message";
import { createProblemReport, listProblemReports } from "@/lib/tickets/problem-reports";
import { updateTicket } from "@/lib/tickets/update-ticket";
import { createVendorWithStaff } from "@/tests/factories/foundation";
import { createMachine, createPublishedSheet, loadVendor, openTicket } from "@/tests/factories/tickets";

describe("desk queue", () => {
  it("filters by assignee, tag, priority, overdue and leaves closed tickets out unless asked", async () => {
    const { vendor: v, support, admin, customer } = await createVendorWithStaff();
    const vendor = await loadVendor(v.id);
    const a = await openTicket(v.id, customer.user.id, { subject: "A" });
    const b = await openTicket(v.id, customer.user.id, { subject: "B" });
    const c = await openTicket(v.id, customer.user.id, { subject: "C" });
    await updateTicket({
      vendor,
      actorUserId: support.user.id,
      input: { ticketId: a.id, assigneeId: support.user.id, tags: ["melting"], priority: "urgent" },
    });
    await updateTicket({ vendor, actorUserId: support.user.id, input: { ticketId: c.id, status: "closed" } });
    await db("tickets")
      .where({ id: b.id })
      .update({ first_response_due_at: new Date(Date.now() - 60_000) });

    const ids = async (filters: Parameters<typeof listQueue>[0]["filters"], userId = support.user.id) =>
      (await listQueue({ vendorId: v.id, userId, filters })).map((t) => t.id).sort();
    expect(await ids({})).toEqual([a.id, b.id].sort());
    expect(await ids({ assignee: "me" })).toEqual([a.id]);
    expect(await ids({ assignee: "me" }, admin.user.id)).toEqual([]);
    expect(await ids({ assignee: "none" })).toEqual([b.id]);
    expect(await ids({ tag: "melting" })).toEqual([a.id]);
    expect(await ids({ priority: ["urgent"] })).toEqual([a.id]);
    expect(await ids({ overdue: true })).toEqual([b.id]);
    expect(await ids({ status: ["closed"] })).toEqual([c.id]);
  });

  it("saved views belong to one agent and carry live counts", async () => {
    const { vendor: v, support, admin, customer } = await createVendorWithStaff();
    await openTicket(v.id, customer.user.id);
    await saveDeskView({ vendorId: v.id, userId: support.user.id, name: "Unassigned", filters: { assignee: "none" } });
    const mine = await listDeskViews({ vendorId: v.id, userId: support.user.id });
    const theirs = await listDeskViews({ vendorId: v.id, userId: admin.user.id });
    expect(mine.filter((x) => !x.builtIn).map((x) => [x.name, x.count])).toEqual([["Unassigned", 1]]);
    expect(theirs.filter((x) => !x.builtIn)).toEqual([]);
    expect(mine.find((x) => x.id === "open")?.count).toBe(1);
  });
});

describe("dashboard and hand-off", () => {
  it("reports the median first-response time and tickets per sheet version", async () => {
    const { vendor: v, support, customer } = await createVendorWithStaff();
    const sheet = await createPublishedSheet(v.id);
    const machine = await createMachine(v.id, customer.user.id);
    const t1 = await openTicket(v.id, customer.user.id, { sheetVersionId: sheet.versionId, machineId: machine.id });
    const t2 = await openTicket(v.id, customer.user.id, { sheetVersionId: sheet.versionId });
    const t3 = await openTicket(v.id, customer.user.id);
    for (const t of [t1, t2, t3])
      await addStaffMessage({ vendorId: v.id, ticketId: t.id, authorId: support.user.id, body: "ok", visibility: "public" });
    // First responses after 1 h, 2 h and 6 h: the median is 2 h.
    for (const [t, h] of [
      [t1, 1],
      [t2, 2],
      [t3, 6],
    ] as const) {
      await db("tickets")
        .where({ id: t.id })
        .update({ first_response_at: db.raw("created_at + make_interval(hours => ?)", [h]) });
    }
    const stats = await getDeskDashboard({ vendorId: v.id });
    expect(stats.medianFirstResponseHours).toBeCloseTo(2, 6);
    expect(stats.perSheetVersion).toEqual([{ sheetVersionId: sheet.versionId, label: `${sheet.title} v1`, tickets: 2 }]);
    expect(stats.openByStatus).toEqual([{ status: "answered", count: 3 }]);
  });

  it("a hand-off is a problem report on the sheet version, listed for that vendor only", async () => {
    const a = await createVendorWithStaff();
    const b = await createVendorWithStaff();
    const sheet = await createPublishedSheet(a.vendor.id);
    const ticket = await openTicket(a.vendor.id, a.customer.user.id, { sheetVersionId: sheet.versionId });
    await createProblemReport({
      vendorId: a.vendor.id,
      actorUserId: a.support.user.id,
      ticketId: ticket.id,
      sheetVersionId: sheet.versionId,
      summary: "vf too low for light routers",
      details: "",
    });
    const reports = await listProblemReports({ vendorId: a.vendor.id, sheetVersionId: sheet.versionId });
    expect(reports.map((r) => [r.summary, r.ticketNumber, r.status])).toEqual([["vf too low for light routers", ticket.number, "open"]]);
    expect(await listProblemReports({ vendorId: b.vendor.id })).toEqual([]);
    await expect(
      createProblemReport({
        vendorId: b.vendor.id,
        actorUserId: b.support.user.id,
        ticketId: ticket.id,
        sheetVersionId: sheet.versionId,
        summary: "x y z",
        details: "",
      }),
    ).rejects.toMatchObject({ code: "not_found" });
  });
});
