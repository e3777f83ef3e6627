import { randomUUID } from "node:crypto";
import { afterAll, afterEach, beforeEach, describe, expect, it } from "vitest";

import type { DeliveryState } from "@/content-schema/webhook-states";
import { recordOutcome } from "@/lib/bench/outcomes";
import { db } from "@/lib/db/knex";
import { stopBoss } from "@/lib/jobs/boss";
import { addStaffMessage } from "@/lib/tickets/add-message";
import { createTicket } from "@/lib/tickets/create-ticket";
import { createWebhook } from "@/lib/webhooks/create-webhook";
import { deliverWebhookJob } from "@/lib/webhooks/deliver-webhook";
import { getWebhook, listDeliveries } from "@/lib/webhooks/list-webhooks";
import { redeliverWebhook, resumeWebhook } from "@/lib/webhooks/manage-webhook";
import { pruneWebhookDeliveriesJob } from "@/lib/webhooks/prune-deliveries";
import { WEBHOOK_DELIVERY_QUEUE } from "@/lib/webhooks/queue-webhook-event";
import { verifySignature } from "@/lib/webhooks/sign-payload";
import { webhookSheetSubscriber } from "@/lib/webhooks/webhook-sheet-subscriber";
import { createBenchSheet, supersede } from "@/tests/factories/bench";
import { createFieldCustomer } from "@/tests/factories/field";
import { createVendorWithStaff, uniq } from "@/tests/factories/foundation";
import { loadVendor } from "@/tests/factories/tickets";
import { receiverAccepts, startReceiver } from "@/tests/support/webhook-receiver";

const env = { ...process.env };
beforeEach(() => {
  process.env.WEBHOOKS_ALLOW_LOOPBACK = "on";
  process.env.NEXTAUTH_SECRET ??= "integration-secret";
  process.env.WEBHOOK_MAX_ATTEMPTS = "3";
  process.env.WEBHOOK_PAUSE_AFTER_FAILURES = "3";
  process.env.WEBHOOK_RETRY_BASE_SECONDS = "30";
  process.env.WEBHOOK_TIMEOUT_MS = "2000";
});
afterEach(() => {
  for (const key of Object.keys(process.env)) if (!(key in env)) delete process.env[key];
  Object.assign(process.env, env);
});
afterAll(async () => {
  await stopBoss();
});

type Job = { id: string; data: { deliveryId: string; attempt: number }; start_after: Date };

/** Queued delivery jobs of one webhook (the worker is off in tests; this runs them as it would). */
async function queuedJobs(webhookId: string): Promise<Job[]> {
  return (
    await db.raw(
      `select j.id, j.data, j.start_after from pgboss.job j join webhook_deliveries d on d.id = (j.data->>'deliveryId')::uuid
       where j.name = ? and j.state = 'created' and d.webhook_id = ? order by j.created_on`,
      [WEBHOOK_DELIVERY_QUEUE, webhookId],
    )
  ).rows;
}

/** Run the queued jobs once each, as the worker would (waits skipped), until none is left or `rounds` is spent. */
async function runDeliveries(webhookId: string, rounds = 10) {
  for (let i = 0; i < rounds; i++) {
    const jobs = await queuedJobs(webhookId);
    if (jobs.length === 0) return;
    for (const job of jobs) {
      await db.raw("update pgboss.job set state = 'completed' where id = ?", [job.id]);
      await deliverWebhookJob(job.data);
    }
  }
}

async function scenario(events: string[] = ["ticket.created"]) {
  const staff = await createVendorWithStaff();
  const vendor = await loadVendor(staff.vendor.id);
  const openTicket = (subject = "Chatter on the finishing pass") =>
    createTicket({
      vendor,
      customerId: staff.customer.user.id,
      input: { subject, body: "Hear it at 18 000 rpm.", idempotencyKey: uniq("key"), attachmentIds: [] },
    });
  return {
    ...staff,
    vendor,
    openTicket,
    hook: (url: string) =>
      createWebhook({ vendorId: vendor.id, userId: staff.admin.user.id, input: { url, description: "", events: events as never } }),
  };
}

describe("webhook delivery", () => {
  it("posts a signed event that a receiver can verify, and logs the answer", async () => {
    const receiver = await startReceiver();
    try {
      const s = await scenario();
      const { id, secret } = await s.hook(receiver.url);
      const ticket = await s.openTicket();
      await runDeliveries(id);
      expect(receiver.received).toHaveLength(1);
      const [got] = receiver.received;
      expect(receiverAccepts(secret, got)).toBe(true);
      expect(got.headers["swarfbook-event"]).toBe("ticket.created");
      const body = JSON.parse(got.body);
      expect(body).toMatchObject({
        type: "ticket.created",
        vendor: s.vendor.slug,
        data: { ticketId: ticket.id, number: ticket.number, subject: "Chatter on the finishing pass" },
      });
      // A changed body, another secret or an old timestamp fail the same check.
      expect(receiverAccepts(secret, { ...got, body: got.body.replace("Chatter", "Chattor") })).toBe(false);
      expect(receiverAccepts(`${secret}x`, got)).toBe(false);
      expect(receiverAccepts(secret, got, Math.floor(Date.now() / 1000) + 301)).toBe(false);
      expect(
        verifySignature({
          secret,
          timestamp: String(got.headers["swarfbook-timestamp"]),
          signature: String(got.headers["swarfbook-signature"]),
          body: got.body,
        }),
      ).toBe(true);
      const [delivery] = await listDeliveries({ vendorId: s.vendor.id, webhookId: id });
      expect(delivery).toMatchObject({
        state: "delivered",
        attempts: 1,
        lastStatus: 200,
        responseExcerpt: "ok",
        eventType: "ticket.created",
      });
      // The secret is stored encrypted: neither it nor its signing form is in the row.
      const row = await db("webhooks").where({ id }).first();
      expect(JSON.stringify(row)).not.toContain(secret);
    } finally {
      await receiver.close();
    }
  });

  it("retries a failed delivery with growing waits and records each answer", async () => {
    const receiver = await startReceiver((n) => (n < 3 ? { status: 500, body: "x".repeat(5000) } : { status: 204 }));
    try {
      const s = await scenario();
      const { id } = await s.hook(receiver.url);
      await s.openTicket();
      const [first] = await queuedJobs(id);
      await db.raw("update pgboss.job set state = 'completed' where id = ?", [first.id]);
      await deliverWebhookJob(first.data);
      let [delivery] = await listDeliveries({ vendorId: s.vendor.id, webhookId: id });
      expect(delivery).toMatchObject({ state: "retrying", attempts: 1, lastStatus: 500 });
      expect(delivery.responseExcerpt?.length).toBe(512);
      const [second] = await queuedJobs(id);
      expect(second.data.attempt).toBe(2);
      const wait1 = (new Date(second.start_after).getTime() - Date.now()) / 1000;
      expect(wait1).toBeGreaterThan(20);
      expect(wait1).toBeLessThanOrEqual(31);
      await db.raw("update pgboss.job set state = 'completed' where id = ?", [second.id]);
      await deliverWebhookJob(second.data);
      const [third] = await queuedJobs(id);
      const wait2 = (new Date(third.start_after).getTime() - Date.now()) / 1000;
      expect(wait2).toBeGreaterThan(50);
      await runDeliveries(id);
      [delivery] = await listDeliveries({ vendorId: s.vendor.id, webhookId: id });
      expect(delivery).toMatchObject({ state: "delivered", attempts: 3, lastStatus: 204 });
      expect(receiver.received).toHaveLength(3);
      // Every attempt carries the same event id and body.
      expect(new Set(receiver.received.map((r) => r.body)).size).toBe(1);
      expect((await getWebhook({ vendorId: s.vendor.id, webhookId: id })).consecutiveFailures).toBe(0);
    } finally {
      await receiver.close();
    }
  });

  it("gives up after the last attempt, pauses after repeated failures, mails the admins, holds events and sends them on resume", async () => {
    let healthy = false;
    const receiver = await startReceiver(() => (healthy ? { status: 200 } : { status: 503, body: "down for maintenance" }));
    try {
      const s = await scenario();
      const { id } = await s.hook(receiver.url);
      await s.openTicket("First");
      await runDeliveries(id);
      const hook = await getWebhook({ vendorId: s.vendor.id, webhookId: id });
      expect(hook).toMatchObject({ state: "paused", consecutiveFailures: 3 });
      const [failed] = await listDeliveries({ vendorId: s.vendor.id, webhookId: id });
      expect(failed).toMatchObject({ state: "failed", attempts: 3, lastStatus: 503, responseExcerpt: "down for maintenance" });
      const mails = (await db.raw("select data from pgboss.job where name = 'mail.send' and data->>'to' = ?", [s.admin.user.email])).rows;
      expect(mails).toHaveLength(1);
      expect(mails[0].data.subject).toContain("Webhook paused");
      expect(mails[0].data.text).toContain(`/admin/integrations/webhooks/${id}`);

      // While paused, a new event is kept but not sent.
      await s.openTicket("Second");
      expect(await queuedJobs(id)).toEqual([]);
      const held = (await listDeliveries({ vendorId: s.vendor.id, webhookId: id })).find((d) => d.state === "held");
      expect(held).toBeDefined();
      await expect(redeliverWebhook({ vendorId: s.vendor.id, webhookId: id, deliveryId: failed.id })).rejects.toThrow(
        "Resume the webhook first.",
      );

      healthy = true;
      const before = receiver.received.length;
      await resumeWebhook({ vendorId: s.vendor.id, userId: s.admin.user.id, webhookId: id });
      await runDeliveries(id);
      expect(receiver.received.length).toBe(before + 1);
      expect(JSON.parse(receiver.received.at(-1)!.body).data.subject).toBe("Second");
      expect(await getWebhook({ vendorId: s.vendor.id, webhookId: id })).toMatchObject({ state: "active", consecutiveFailures: 0 });
    } finally {
      await receiver.close();
    }
  });

  it("redelivers the same event with a fresh signature, once per click", async () => {
    const receiver = await startReceiver();
    try {
      const s = await scenario();
      const { id, secret } = await s.hook(receiver.url);
      await s.openTicket();
      await runDeliveries(id);
      const [delivery] = await listDeliveries({ vendorId: s.vendor.id, webhookId: id });
      await redeliverWebhook({ vendorId: s.vendor.id, webhookId: id, deliveryId: delivery.id });
      await expect(redeliverWebhook({ vendorId: s.vendor.id, webhookId: id, deliveryId: delivery.id })).rejects.toThrow(
        "already on its way",
      );
      expect(await queuedJobs(id)).toHaveLength(1);
      await runDeliveries(id);
      expect(receiver.received).toHaveLength(2);
      expect(receiver.received[1].body).toBe(receiver.received[0].body);
      expect(receiverAccepts(secret, receiver.received[1])).toBe(true);
      const [after] = await listDeliveries({ vendorId: s.vendor.id, webhookId: id });
      expect(after).toMatchObject({ state: "delivered", attempts: 2 });
    } finally {
      await receiver.close();
    }
  });

  it("times out a receiver that never answers", async () => {
    process.env.WEBHOOK_TIMEOUT_MS = "300";
    const receiver = await startReceiver(() => "hang");
    try {
      const s = await scenario();
      const { id } = await s.hook(receiver.url);
      await s.openTicket();
      const [job] = await queuedJobs(id);
      await deliverWebhookJob(job.data);
      const [delivery] = await listDeliveries({ vendorId: s.vendor.id, webhookId: id });
      expect(delivery).toMatchObject({ state: "retrying", lastStatus: null });
      expect(delivery.lastError).toContain("No answer within 300 ms");
    } finally {
      await receiver.close();
    }
  });

  it("keeps vendors apart: another vendor's webhook and deliveries are not found, and its events never arrive", async () => {
    const receiver = await startReceiver();
    try {
      const a = await scenario();
      const b = await scenario();
      const { id } = await a.hook(receiver.url);
      await b.openTicket();
      await a.openTicket();
      await runDeliveries(id);
      expect(receiver.received.map((r) => JSON.parse(r.body).vendor)).toEqual([a.vendor.slug]);
      const [delivery] = await listDeliveries({ vendorId: a.vendor.id, webhookId: id });
      await expect(getWebhook({ vendorId: b.vendor.id, webhookId: id })).rejects.toThrow("No such webhook.");
      expect(await listDeliveries({ vendorId: b.vendor.id, webhookId: id })).toEqual([]);
      await expect(redeliverWebhook({ vendorId: b.vendor.id, webhookId: id, deliveryId: delivery.id })).rejects.toThrow(
        "No such delivery.",
      );
      await expect(resumeWebhook({ vendorId: b.vendor.id, userId: b.admin.user.id, webhookId: id })).rejects.toThrow("No such webhook.");
    } finally {
      await receiver.close();
    }
  });

  it("sends sheet, answer and outcome events, each sheet event once however often its job runs", async () => {
    const receiver = await startReceiver();
    try {
      const s = await scenario(["sheet.published", "sheet.superseded", "ticket.answered", "outcome.reported"]);
      const { id, secret } = await s.hook(receiver.url);
      const sheet = await createBenchSheet(s.vendor.id);
      const event = await supersede(s.vendor.id, sheet.sheetId);
      await webhookSheetSubscriber.handle(event);
      await webhookSheetSubscriber.handle(event);
      const ticket = await s.openTicket();
      await addStaffMessage({
        vendorId: s.vendor.id,
        ticketId: ticket.id,
        authorId: s.support.user.id,
        body: "Lower the feed.",
        visibility: "public",
      });
      await addStaffMessage({
        vendorId: s.vendor.id,
        ticketId: ticket.id,
        authorId: s.support.user.id,
        body: "Internal only.",
        visibility: "note",
      });
      const customer = await createFieldCustomer(s.vendor.id);
      const [setup] = await db("setups")
        .insert({
          vendor_id: s.vendor.id,
          user_id: customer.userId,
          machine_id: customer.machineId,
          sheet_version_id: event.versionId,
          result: "{}",
        })
        .returning("id");
      await recordOutcome({
        vendorId: s.vendor.id,
        userId: customer.userId,
        setupId: setup.id,
        fields: { result: "failed", symptom: "chatter", changes: {}, notes: "" },
        idempotencyKey: randomUUID(),
      });
      await runDeliveries(id);
      const bodies = receiver.received.map((r) => JSON.parse(r.body));
      expect(bodies.map((b) => b.type).sort()).toEqual(["outcome.reported", "sheet.published", "sheet.superseded", "ticket.answered"]);
      expect(receiver.received.every((r) => receiverAccepts(secret, r))).toBe(true);
      const published = bodies.find((b) => b.type === "sheet.published");
      expect(published.data).toMatchObject({ sheet: sheet.sheetSlug, version: 2, supersedes: 1 });
      expect(published.data.url).toContain(`/${s.vendor.slug}/library/${sheet.sheetSlug}/v/2`);
      expect(bodies.find((b) => b.type === "sheet.superseded").data).toMatchObject({ version: 1, supersededBy: 2 });
      expect(bodies.find((b) => b.type === "outcome.reported").data).toMatchObject({
        sheet: sheet.sheetSlug,
        version: 2,
        result: "failed",
        symptom: "chatter",
      });
      expect(bodies.find((b) => b.type === "ticket.answered").data).toMatchObject({ ticketId: ticket.id });
    } finally {
      await receiver.close();
    }
  });

  it("prunes finished deliveries after 30 days and keeps held ones", async () => {
    const s = await scenario();
    const { id } = await s.hook("http://127.0.0.1:9/never");
    const row = (state: DeliveryState, days: number) => ({
      vendor_id: s.vendor.id,
      webhook_id: id,
      event_id: randomUUID(),
      event_type: "ticket.created" as const,
      body: "{}",
      state,
      created_at: db.raw(`now() - interval '${days} days'`),
    });
    await db("webhook_deliveries").insert([row("delivered", 31), row("failed", 31), row("held", 31), row("delivered", 29)]);
    await pruneWebhookDeliveriesJob();
    const left = await db("webhook_deliveries").where({ webhook_id: id }).orderBy("state").select("state");
    expect(left.map((r) => r.state)).toEqual(["delivered", "held"]);
  });
});
