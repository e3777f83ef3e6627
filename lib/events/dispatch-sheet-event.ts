import "server-only";

import { enqueue } from "@/lib/jobs/enqueue";

import { sheetEventSchema } from "./sheet-events";
import { SHEET_EVENT_SUBSCRIBERS } from "./subscribers";

export const SHEET_EVENT_DELIVERY_QUEUE = "sheet.events.deliver";

/** Fan one event out into one job per subscriber, so each retries on its own. */
export async function dispatchSheetEvent(data: unknown): Promise<void> {
  const event = sheetEventSchema.parse(data);
  for (const subscriber of SHEET_EVENT_SUBSCRIBERS) {
    await enqueue(SHEET_EVENT_DELIVERY_QUEUE, { subscriber: subscriber.name, event });
  }
}

export async function deliverSheetEvent(data: unknown): Promise<void> {
  const { subscriber, event } = data as { subscriber: string; event: unknown };
  const target = SHEET_EVENT_SUBSCRIBERS.find((s) => s.name === subscriber);
  if (!target) return;
  await target.handle(sheetEventSchema.parse(event));
}
