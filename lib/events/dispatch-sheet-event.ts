import "server-only";

import { db } from "@/lib/db/knex";
import { enqueue } from "@/lib/jobs/enqueue";
import type { JobMeta } from "@/lib/jobs/job-meta";

import { sheetEventSchema } from "./sheet-events";
import { SHEET_EVENT_SUBSCRIBERS } from "./subscribers";

export const SHEET_EVENT_DELIVERY_QUEUE = "sheet.events.deliver";

/**
 * Fan one event out into one job per subscriber, so each retries on its own. The deliveries are keyed by
 * the event's job, so a retried fan-out queues nothing twice; one transaction queues all or none.
 */
export async function dispatchSheetEvent(data: unknown, job?: JobMeta): Promise<void> {
  const event = sheetEventSchema.parse(data);
  await db.transaction(async (trx) => {
    for (const subscriber of SHEET_EVENT_SUBSCRIBERS) {
      await enqueue(
        trx,
        SHEET_EVENT_DELIVERY_QUEUE,
        { subscriber: subscriber.name, event },
        { key: job ? `${job.id}:${subscriber.name}` : undefined },
      );
    }
  });
}

export async function deliverSheetEvent(data: unknown): Promise<void> {
  const { subscriber, event } = data as { subscriber: string; event: unknown };
  const target = SHEET_EVENT_SUBSCRIBERS.find((s) => s.name === subscriber);
  if (!target) return;
  await target.handle(sheetEventSchema.parse(event));
}
