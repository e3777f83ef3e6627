import { afterAll, afterEach, beforeEach, describe, expect, it } from "vitest";

import { db } from "@/lib/db/knex";
import { stopBoss } from "@/lib/jobs/boss";
import { createTicket } from "@/lib/tickets/create-ticket";
import { createWebhook } from "@/lib/webhooks/create-webhook";
import { deliverWebhookJob } from "@/lib/webhooks/deliver-webhook";
import { listDeliveries } from "@/lib/webhooks/list-webhooks";
import { WEBHOOK_DELIVERY_QUEUE } from "@/lib/webhooks/queue-webhook-event";
import { createVendorWithStaff, uniq } from "@/tests/factories/foundation";
import { loadVendor } from "@/tests/factories/tickets";
import { startReceiver } from "@/tests/support/webhook-receiver";

const env = { ...process.env };
beforeEach(() => {
  process.env.NEXTAUTH_SECRET ??= "integration-secret";
});
afterEach(() => {
  for (const key of Object.keys(process.env)) if (!(key in env)) delete process.env[key];
  Object.assign(process.env, env);
});
afterAll(async () => {
  await stopBoss();
});

async function refusal(vendorId: string, userId: string, url: string): Promise<string | null> {
  try {
    await createWebhook({ vendorId, userId, input: { url, description: "", events: ["ticket.created"] } });
    return null;
  } catch (error) {
    return JSON.stringify((error as { fieldErrors?: unknown }).fieldErrors ?? (error as Error).message);
  }
}

describe("webhook addresses", () => {
  it("refuses plain http, loopback, private, link-local and mapped addresses without the test flag", async () => {
    delete process.env.WEBHOOKS_ALLOW_LOOPBACK;
    const { vendor, admin } = await createVendorWithStaff();
    const cases: [string, RegExp][] = [
      ["http://example.com/hook", /https only/],
      ["http://127.0.0.1:9/hook", /https only/],
      ["https://127.0.0.1/hook", /127\.0\.0\.1, a private, loopback or reserved address/],
      ["https://localhost/hook", /localhost points to (127\.0\.0\.1|::1)/],
      ["https://10.20.30.40/hook", /private, loopback or reserved/],
      ["https://172.16.0.5/hook", /private, loopback or reserved/],
      ["https://192.168.1.1/hook", /private, loopback or reserved/],
      ["https://169.254.169.254/latest/meta-data", /private, loopback or reserved/],
      ["https://100.64.0.1/hook", /private, loopback or reserved/],
      ["https://0.0.0.0/hook", /private, loopback or reserved/],
      ["https://[::1]/hook", /private, loopback or reserved/],
      ["https://[::ffff:127.0.0.1]/hook", /private, loopback or reserved/],
      ["https://[::ffff:a9fe:a9fe]/hook", /private, loopback or reserved/],
      ["https://[fd00::1]/hook", /private, loopback or reserved/],
      ["https://[fe80::1]/hook", /private, loopback or reserved/],
      ["https://user:pw@example.com/hook", /user name or password/],
      ["ftp://example.com/hook", /https only/],
      ["not a url", /full address/],
    ];
    for (const [url, expected] of cases) expect(await refusal(vendor.id, admin.user.id, url), url).toMatch(expected);
    expect(await db("webhooks").where({ vendor_id: vendor.id })).toEqual([]);
  });

  it("with the test flag allows http to loopback only, never to other private addresses", async () => {
    process.env.WEBHOOKS_ALLOW_LOOPBACK = "on";
    const { vendor, admin } = await createVendorWithStaff();
    expect(await refusal(vendor.id, admin.user.id, "http://10.0.0.1/hook")).toMatch(/https only/);
    expect(await refusal(vendor.id, admin.user.id, "https://192.168.0.1/hook")).toMatch(/private, loopback or reserved/);
    expect(await refusal(vendor.id, admin.user.id, "https://169.254.169.254/")).toMatch(/private, loopback or reserved/);
    expect(await refusal(vendor.id, admin.user.id, "http://127.0.0.1:9/hook")).toBeNull();
    expect(await refusal(vendor.id, admin.user.id, "http://localhost:9/hook")).toBeNull();
  });

  it("checks the address again at delivery: a webhook that now points inside the network is refused, nothing is sent", async () => {
    process.env.WEBHOOKS_ALLOW_LOOPBACK = "on";
    const receiver = await startReceiver();
    try {
      const staff = await createVendorWithStaff();
      const { id } = await createWebhook({
        vendorId: staff.vendor.id,
        userId: staff.admin.user.id,
        input: { url: receiver.url, description: "", events: ["ticket.created"] },
      });
      await createTicket({
        vendor: await loadVendor(staff.vendor.id),
        customerId: staff.customer.user.id,
        input: { subject: "Hello there", body: "A question.", idempotencyKey: uniq("k"), attachmentIds: [] },
      });
      delete process.env.WEBHOOKS_ALLOW_LOOPBACK;
      const job = (
        await db.raw(
          "select j.data from pgboss.job j join webhook_deliveries d on d.id = (j.data->>'deliveryId')::uuid where j.name = ? and d.webhook_id = ?",
          [WEBHOOK_DELIVERY_QUEUE, id],
        )
      ).rows[0];
      await deliverWebhookJob(job.data);
      expect(receiver.received).toEqual([]);
      const [delivery] = await listDeliveries({ vendorId: staff.vendor.id, webhookId: id });
      expect(delivery.lastError).toMatch(/^Refused: /);
      expect(delivery.state).toBe("retrying");
    } finally {
      await receiver.close();
    }
  });
});
