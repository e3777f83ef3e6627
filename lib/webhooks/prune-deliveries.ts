import "server-only";

import { db } from "@/lib/db/knex";

export const WEBHOOK_PRUNE_QUEUE = "webhooks.prune";
export const WEBHOOK_PRUNE_CRON = "40 3 * * *";

/** Days a finished delivery stays in the log. */
export const webhookLogDays = () => {
  const days = Number(process.env.WEBHOOK_LOG_DAYS);
  return Number.isFinite(days) && days >= 1 ? Math.round(days) : 30;
};

/** Job (daily): the log keeps finished deliveries for a while, not for ever. Held and pending ones stay. */
export async function pruneWebhookDeliveriesJob(): Promise<void> {
  await db("webhook_deliveries")
    .whereIn("state", ["delivered", "failed"])
    .where("created_at", "<", db.raw("now() - make_interval(days => ?)", [webhookLogDays()]))
    .delete();
}
