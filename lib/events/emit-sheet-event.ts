import "server-only";

import type { Knex } from "knex";

import { enqueue } from "@/lib/jobs/enqueue";

import { SHEET_EVENTS_QUEUE, type SheetEvent, sheetEventSchema } from "./sheet-events";

/**
 * Record a sheet or catalogue event for the subscribers, inside the transaction that made the change:
 * the event exists if and only if the change committed. The job queue retries, so a subscriber that is
 * down loses nothing.
 */
export async function emitSheetEvent(trx: Knex.Transaction, event: SheetEvent): Promise<void> {
  await enqueue(trx, SHEET_EVENTS_QUEUE, sheetEventSchema.parse(event));
}
