import "server-only";

import { z } from "zod";

import { db } from "@/lib/db/knex";

import { pauseWebhook } from "./pause-webhook";
import { postWebhook, type PostResult } from "./post-webhook";
import { enqueueDeliveryAttempt } from "./queue-webhook-event";
import { RefusedTarget, resolveTarget } from "./resolve-target";
import { openSecret } from "./secret-box";
import { DELIVERY_HEADER, EVENT_HEADER, SIGNATURE_HEADER, signPayload, TIMESTAMP_HEADER } from "./sign-payload";
import { retryDelaySeconds, webhookSettings } from "./webhook-settings";

const jobSchema = z.object({ deliveryId: z.uuid(), attempt: z.int().min(1) });

type Row = {
  id: string;
  vendor_id: string;
  webhook_id: string;
  event_id: string;
  event_type: string;
  body: string;
  state: string;
  attempts: number;
  url: string;
  secret_encrypted: string;
  webhook_state: "active" | "paused";
};

/** Job: one attempt of one delivery. HTTP failures are recorded and retried by a new job with a wait, never thrown. */
export async function deliverWebhookJob(data: unknown): Promise<void> {
  const { deliveryId, attempt } = jobSchema.parse(data);
  const row = await db("webhook_deliveries as d")
    .join("webhooks as w", (j) => j.on("w.id", "d.webhook_id").andOn("w.vendor_id", "d.vendor_id"))
    .where("d.id", deliveryId)
    .first<Row | undefined>("d.*", "w.url", "w.secret_encrypted", "w.state as webhook_state");
  // Gone, or this attempt already ran (a repeated job).
  if (!row || row.attempts >= attempt || row.state === "delivered") return;
  if (row.webhook_state !== "active") {
    await db("webhook_deliveries").where({ id: row.id, vendor_id: row.vendor_id }).update({ state: "held", next_attempt_at: null });
    return;
  }
  const settings = webhookSettings();
  const result = await sendAttempt(row, settings);
  const ok = result.status !== null && result.status >= 200 && result.status < 300;
  await db.transaction(async (trx) => {
    const hook = await trx("webhooks")
      .where({ id: row.webhook_id, vendor_id: row.vendor_id })
      .forUpdate()
      .first("state", "consecutive_failures");
    if (!hook) return;
    const retry = !ok && attempt < settings.maxAttempts;
    const wait = retry ? retryDelaySeconds(attempt + 1, settings) : 0;
    await trx("webhook_deliveries")
      .where({ id: row.id, vendor_id: row.vendor_id })
      .update({
        attempts: attempt,
        state: ok ? "delivered" : retry ? "retrying" : "failed",
        last_status: result.status,
        last_error: result.error,
        response_excerpt: result.excerpt,
        duration_ms: result.durationMs,
        last_attempt_at: trx.fn.now(),
        next_attempt_at: retry ? new Date(Date.now() + wait * 1000) : null,
        ...(ok ? { delivered_at: trx.fn.now() } : {}),
      });
    if (ok) {
      await trx("webhooks").where({ id: row.webhook_id, vendor_id: row.vendor_id }).update({ consecutive_failures: 0 });
      return;
    }
    const failures = hook.consecutive_failures + 1;
    await trx("webhooks").where({ id: row.webhook_id, vendor_id: row.vendor_id }).update({ consecutive_failures: failures });
    if (retry)
      await enqueueDeliveryAttempt(trx, { deliveryId: row.id, attempt: attempt + 1, key: `${row.id}:${attempt + 1}`, afterSeconds: wait });
    if (hook.state === "active" && failures >= settings.pauseAfterFailures)
      await pauseWebhook(trx, { vendorId: row.vendor_id, webhookId: row.webhook_id, failures });
  });
}

async function sendAttempt(row: Row, settings: ReturnType<typeof webhookSettings>): Promise<PostResult> {
  try {
    // Resolved and checked again at every attempt: a name that now points inside the network is refused.
    const target = await resolveTarget(row.url, settings);
    const timestamp = Math.floor(Date.now() / 1000);
    const headers = {
      [TIMESTAMP_HEADER]: String(timestamp),
      [SIGNATURE_HEADER]: signPayload(openSecret(row.secret_encrypted), timestamp, row.body),
      [EVENT_HEADER]: row.event_type,
      [DELIVERY_HEADER]: row.id,
    };
    return await postWebhook(target, row.body, headers, settings.timeoutMs);
  } catch (error) {
    if (error instanceof RefusedTarget) return { status: null, error: `Refused: ${error.message}`, excerpt: null, durationMs: 0 };
    throw error;
  }
}
