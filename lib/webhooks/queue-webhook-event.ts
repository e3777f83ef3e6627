import "server-only";

import { randomUUID } from "node:crypto";
import type { Knex } from "knex";

import { webhookEnvelopeSchema, type WebhookEventData, type WebhookEventType } from "@/content-schema/webhook-events";
import { enqueue } from "@/lib/jobs/enqueue";

export const WEBHOOK_DELIVERY_QUEUE = "webhooks.deliver";

type Event<T extends WebhookEventType> = {
  vendorId: string;
  type: T;
  data: WebhookEventData<T>;
  /** Give one when the same event could be queued twice (a retried job): one id, one delivery per webhook. */
  eventId?: string;
};

/**
 * Record an event for the vendor's webhooks inside the transaction of the write that caused it: a delivery
 * row and its job per subscribed webhook, committed with the write or not at all. A paused webhook keeps the
 * delivery "held" until it is resumed.
 */
export async function queueWebhookEvent<T extends WebhookEventType>(trx: Knex.Transaction, event: Event<T>): Promise<void> {
  const hooks = await trx("webhooks").where({ vendor_id: event.vendorId }).whereRaw("? = any(events)", [event.type]).select("id", "state");
  if (hooks.length === 0) return;
  const vendor = await trx("vendors").where({ id: event.vendorId }).first<{ slug: string }>("slug");
  const envelope = webhookEnvelopeSchema(event.type).parse({
    id: event.eventId ?? randomUUID(),
    type: event.type,
    vendor: vendor.slug,
    occurredAt: new Date().toISOString(),
    data: event.data,
  });
  const body = JSON.stringify(envelope);
  for (const hook of hooks) {
    const [row] = await trx("webhook_deliveries")
      .insert({
        vendor_id: event.vendorId,
        webhook_id: hook.id,
        event_id: envelope.id,
        event_type: event.type,
        body,
        state: hook.state === "active" ? "pending" : "held",
      })
      .onConflict(["webhook_id", "event_id"])
      .ignore()
      .returning("id");
    if (row && hook.state === "active") await enqueueDeliveryAttempt(trx, { deliveryId: row.id, attempt: 1, key: `${row.id}:1` });
  }
}

export async function enqueueDeliveryAttempt(
  trx: Knex.Transaction,
  o: { deliveryId: string; attempt: number; key: string; afterSeconds?: number },
) {
  await enqueue(
    trx,
    WEBHOOK_DELIVERY_QUEUE,
    { deliveryId: o.deliveryId, attempt: o.attempt },
    { key: o.key, ...(o.afterSeconds ? { startAfter: o.afterSeconds } : {}) },
  );
}
