import "server-only";

import { db } from "@/lib/db/knex";
import { NotFound } from "@/lib/errors/domain-errors";

import { DELIVERY_COLUMNS, rowToDelivery, rowToWebhook, WEBHOOK_COLUMNS, type Webhook, type WebhookDelivery } from "./webhook-rows";

export async function listWebhooks({ vendorId }: { vendorId: string }): Promise<Webhook[]> {
  const rows = await db("webhooks")
    .where({ vendor_id: vendorId })
    .orderBy("created_at")
    .select(...WEBHOOK_COLUMNS);
  return rows.map(rowToWebhook);
}

/** One webhook of this vendor, or null (another vendor's is not found). */
export async function findWebhook({ vendorId, webhookId }: { vendorId: string; webhookId: string }): Promise<Webhook | null> {
  const row = await db("webhooks")
    .where({ vendor_id: vendorId, id: webhookId })
    .first(...WEBHOOK_COLUMNS);
  return row ? rowToWebhook(row) : null;
}

/** One webhook of this vendor; another vendor's is not found. */
export async function getWebhook(o: { vendorId: string; webhookId: string }): Promise<Webhook> {
  const hook = await findWebhook(o);
  if (!hook) throw new NotFound("No such webhook.");
  return hook;
}

export const DELIVERY_LOG_SIZE = 50;

/** The newest deliveries of one webhook, for the log. */
export async function listDeliveries({ vendorId, webhookId }: { vendorId: string; webhookId: string }): Promise<WebhookDelivery[]> {
  const rows = await db("webhook_deliveries")
    .where({ vendor_id: vendorId, webhook_id: webhookId })
    .orderBy([
      { column: "created_at", order: "desc" },
      { column: "id", order: "desc" },
    ])
    .limit(DELIVERY_LOG_SIZE)
    .select(...DELIVERY_COLUMNS);
  return rows.map(rowToDelivery);
}
