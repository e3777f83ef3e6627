import { afterAll, describe, expect, it } from "vitest";

import { recordOutcome } from "@/lib/bench/outcomes";
import { db } from "@/lib/db/knex";
import { dispatchSheetEvent } from "@/lib/events/dispatch-sheet-event";
import { stopBoss } from "@/lib/jobs/boss";
import { enqueue } from "@/lib/jobs/enqueue";
import { enqueueMail } from "@/lib/mail/enqueue-mail";
import { addCustomerMessage, addStaffMessage } from "@/lib/tickets/add-message";
import { createProblemReport } from "@/lib/tickets/problem-reports";
import { createBenchSheet } from "@/tests/factories/bench";
import { createFieldCustomer } from "@/tests/factories/field";
import { createVendorWithStaff, uniq } from "@/tests/factories/foundation";
import { openTicket } from "@/tests/factories/tickets";

afterAll(async () => {
  await stopBoss();
});

const jobsTo = async (to: string) =>
  (await db.raw("select id, data from pgboss.job where name = 'mail.send' and data->>'to' = ?", [to])).rows as {
    id: string;
    data: { text: string };
  }[];
const count = async (name: string, where = "true", bindings: string[] = []) =>
  Number((await db.raw(`select count(*)::int as n from pgboss.job where name = ? and ${where}`, [name, ...bindings])).rows[0].n);

describe("transactional outbox", () => {
  it("a job queued in a transaction that rolls back is not queued", async () => {
    const to = `${uniq("rollback")}@example.test`;
    await expect(
      db.transaction(async (trx) => {
        await enqueueMail(trx, { to, subject: "Never", text: "This write failed." });
        throw new Error("the write failed after queueing");
      }),
    ).rejects.toThrow("the write failed");
    expect(await jobsTo(to)).toEqual([]);
  });

  it("a job queued in a committed transaction is there, once per key", async () => {
    const to = `${uniq("keyed")}@example.test`;
    await db.transaction(async (trx) => {
      await enqueueMail(trx, { to, subject: "Once", text: "Keyed." }, { key: "purpose:1" });
      await enqueueMail(trx, { to, subject: "Once", text: "Keyed." }, { key: "purpose:1" });
    });
    await enqueueMail(db, { to, subject: "Once", text: "Keyed." }, { key: "purpose:1" });
    expect(await jobsTo(to)).toHaveLength(1);
  });

  it("a reply whose mail cannot be queued is not saved either (all or nothing)", async () => {
    const { vendor, support, customer } = await createVendorWithStaff();
    const ticket = await openTicket(vendor.id, customer.user.id);
    // The customer's address no longer passes the mail schema: queueing the notification throws inside the write.
    await db("users").where({ id: customer.user.id }).update({ email: "not-an-address" });
    await expect(
      addStaffMessage({
        vendorId: vendor.id,
        ticketId: ticket.id,
        authorId: support.user.id,
        body: "Lower the feed.",
        visibility: "public",
      }),
    ).rejects.toThrow();
    expect(await db("ticket_messages").where({ ticket_id: ticket.id, body: "Lower the feed." })).toEqual([]);
  });

  it("a resubmitted reply posts once and mails once", async () => {
    const { vendor, support, customer } = await createVendorWithStaff();
    const ticket = await openTicket(vendor.id, customer.user.id);
    const reply = {
      vendorId: vendor.id,
      ticketId: ticket.id,
      authorId: customer.user.id,
      body: "Still chatters.",
      idempotencyKey: uniq("reply"),
    };
    const [first, second] = await Promise.all([addCustomerMessage(reply), addCustomerMessage(reply)]);
    expect(first.id).toBe(second.id);
    expect([first.created, second.created].sort()).toEqual([false, true]);
    expect(await db("ticket_messages").where({ ticket_id: ticket.id, body: "Still chatters." })).toHaveLength(1);
    expect((await jobsTo(support.user.email)).filter((j) => j.data.text.includes("Still chatters."))).toHaveLength(1);
  });

  it("a resubmitted outcome report or hand-off is recorded once, with one rollup refresh", async () => {
    const { vendor, support, customer } = await createVendorWithStaff();
    const sheet = await createBenchSheet(vendor.id);
    const field = await createFieldCustomer(vendor.id);
    const [setup] = await db("setups")
      .insert({ vendor_id: vendor.id, user_id: field.userId, machine_id: field.machineId, sheet_version_id: sheet.versionId, result: "{}" })
      .returning("id");
    const outcome = {
      vendorId: vendor.id,
      userId: field.userId,
      setupId: setup.id,
      fields: { result: "worked_as_written" as const, changes: {}, notes: "" },
      idempotencyKey: uniq("outcome"),
    };
    const a = await recordOutcome(outcome);
    const b = await recordOutcome(outcome);
    expect(b).toEqual({ id: a.id, created: false });
    expect(await db("outcomes").where({ setup_id: setup.id })).toHaveLength(1);
    expect(await count("field.refresh-rollups")).toBeGreaterThan(0);

    const ticket = await openTicket(vendor.id, customer.user.id);
    const handoff = {
      vendorId: vendor.id,
      actorUserId: support.user.id,
      ticketId: ticket.id,
      sheetVersionId: sheet.versionId,
      summary: "vf too high",
      details: "",
      idempotencyKey: uniq("handoff"),
    };
    const [h1, h2] = await Promise.all([createProblemReport(handoff), createProblemReport(handoff)]);
    expect(h1.id).toBe(h2.id);
    expect(await db("problem_reports").where({ ticket_id: ticket.id })).toHaveLength(1);
  });

  it("a retried event fan-out queues each subscriber's delivery once", async () => {
    const { vendor } = await createVendorWithStaff();
    const sheet = await createBenchSheet(vendor.id);
    const event = { type: "version.withdrawn" as const, vendorId: vendor.id, sheetId: sheet.sheetId, versionId: sheet.versionId };
    const job = { id: "00000000-0000-4000-8000-000000000abc", retryCount: 0 };
    await dispatchSheetEvent(event, job);
    await dispatchSheetEvent(event, { ...job, retryCount: 1 });
    const deliveries = await count("sheet.events.deliver", "data->'event'->>'versionId' = ?", [sheet.versionId]);
    const subscribers = (await import("@/lib/events/subscribers")).SHEET_EVENT_SUBSCRIBERS.length;
    expect(deliveries).toBe(subscribers);
  });

  it("enqueue returns null for a repeated key", async () => {
    const key = uniq("reindex");
    const vendorId = "00000000-0000-4000-8000-000000000def";
    expect(await enqueue(db, "search.reindex-vendor", { vendorId }, { key })).toEqual(expect.any(String));
    expect(await enqueue(db, "search.reindex-vendor", { vendorId }, { key })).toBeNull();
  });
});
