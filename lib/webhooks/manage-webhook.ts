import "server-only";

import { writeAudit } from "@/lib/audit/write-audit";
import { db } from "@/lib/db/knex";
import { Conflict, NotFound } from "@/lib/errors/domain-errors";

import { enqueueDeliveryAttempt } from "./queue-webhook-event";

type Target = { vendorId: string; userId: string; webhookId: string };

/** Send one delivery again (same event id and body, a new timestamp and signature). */
export async function redeliverWebhook({
  vendorId,
  webhookId,
  deliveryId,
}: Omit<Target, "userId"> & { deliveryId: string }): Promise<void> {
  await db.transaction(async (trx) => {
    const row = await trx("webhook_deliveries as d")
      .join("webhooks as w", (j) => j.on("w.id", "d.webhook_id").andOn("w.vendor_id", "d.vendor_id"))
      .where({ "d.id": deliveryId, "d.vendor_id": vendorId, "d.webhook_id": webhookId })
      .forUpdate()
      .first<{ attempts: number; state: string; webhook_state: string } | undefined>("d.attempts", "d.state", "w.state as webhook_state");
    if (!row) throw new NotFound("No such delivery.");
    if (row.webhook_state !== "active") throw new Conflict("Resume the webhook first.");
    if (row.state === "pending" || row.state === "retrying") throw new Conflict("This delivery is already on its way.");
    await trx("webhook_deliveries").where({ id: deliveryId, vendor_id: vendorId }).update({ state: "pending", next_attempt_at: null });
    // Keyed by the attempts so far: a double click queues one attempt.
    await enqueueDeliveryAttempt(trx, { deliveryId, attempt: row.attempts + 1, key: `${deliveryId}:redeliver:${row.attempts}` });
  });
}

/** Resume a paused webhook; what was held while it was paused is sent now. */
export async function resumeWebhook({ vendorId, userId, webhookId }: Target): Promise<void> {
  await db.transaction(async (trx) => {
    const hook = await trx("webhooks").where({ vendor_id: vendorId, id: webhookId }).forUpdate().first("state", "paused_at");
    if (!hook) throw new NotFound("No such webhook.");
    if (hook.state === "active") return;
    await trx("webhooks")
      .where({ vendor_id: vendorId, id: webhookId })
      .update({ state: "active", consecutive_failures: 0, paused_at: null });
    const held = await trx("webhook_deliveries")
      .where({ vendor_id: vendorId, webhook_id: webhookId })
      .whereIn("state", ["held", "retrying", "pending"])
      .orderBy("created_at")
      .limit(500)
      .select<{ id: string; attempts: number }[]>("id", "attempts");
    const since = hook.paused_at?.getTime() ?? 0;
    for (const d of held) {
      await trx("webhook_deliveries").where({ id: d.id, vendor_id: vendorId }).update({ state: "pending", next_attempt_at: null });
      await enqueueDeliveryAttempt(trx, { deliveryId: d.id, attempt: d.attempts + 1, key: `${d.id}:resume:${since}:${d.attempts}` });
    }
    await writeAudit(
      {
        vendorId,
        actorUserId: userId,
        action: "webhook.resume",
        objectType: "webhook",
        objectId: webhookId,
        details: { held: held.length },
      },
      trx,
    );
  });
}

export async function deleteWebhook({ vendorId, userId, webhookId }: Target): Promise<void> {
  await db.transaction(async (trx) => {
    const [row] = await trx("webhooks").where({ vendor_id: vendorId, id: webhookId }).delete().returning("url");
    if (!row) throw new NotFound("No such webhook.");
    await writeAudit(
      { vendorId, actorUserId: userId, action: "webhook.delete", objectType: "webhook", objectId: webhookId, details: { url: row.url } },
      trx,
    );
  });
}
