import "server-only";

import { enqueue } from "@/lib/jobs/enqueue";

import { SHEET_EVENTS_QUEUE, type SheetEvent, sheetEventSchema } from "./sheet-events";

/**
 * Record a sheet or catalogue event for the subscribers. Call it AFTER the transaction that made
 * the change has committed; the job queue retries, so a subscriber that is down loses nothing.
 */
export async function emitSheetEvent(event: SheetEvent): Promise<void> {
  await enqueue(SHEET_EVENTS_QUEUE, sheetEventSchema.parse(event));
}
