import "server-only";

import { enqueue } from "@/lib/jobs/enqueue";
import { invalidateLibrary } from "@/lib/library/library-cache";

import { SHEET_EVENTS_QUEUE, type SheetEvent, sheetEventSchema } from "./sheet-events";

/**
 * Record a sheet or catalogue event for the subscribers. Call it AFTER the transaction that made
 * the change has committed; the job queue retries, so a subscriber that is down loses nothing.
 */
export async function emitSheetEvent(event: SheetEvent): Promise<void> {
  const parsed = sheetEventSchema.parse(event);
  // The cached Library pages of this process go at once; the subscribers follow in jobs.
  invalidateLibrary({ vendorId: parsed.vendorId, sheetId: parsed.type === "catalogue.changed" ? undefined : parsed.sheetId });
  await enqueue(SHEET_EVENTS_QUEUE, parsed);
}
