import "server-only";

import type { Knex } from "knex";

import { enqueue } from "@/lib/jobs/enqueue";
import { invalidateLibrary } from "@/lib/library/library-cache";
import { bumpLibraryGeneration } from "@/lib/library/library-generation";

import { SHEET_EVENTS_QUEUE, sheetEventSchema, type SheetEvent } from "./sheet-events";

/**
 * Record a sheet or catalogue event for the subscribers, inside the transaction that made the change:
 * the event exists if and only if the change committed. The job queue retries, so a subscriber that is
 * down loses nothing.
 */
export async function emitSheetEvent(trx: Knex.Transaction, event: SheetEvent): Promise<void> {
  const parsed = sheetEventSchema.parse(event);
  await enqueue(trx, SHEET_EVENTS_QUEUE, parsed);
  // Stored Library pages of every app instance stop being served when this transaction commits.
  await bumpLibraryGeneration(trx, parsed.vendorId);
  // The cached Library pages of this process go once the change is committed (earlier, a concurrent render
  // could cache the old state again); the subscribers follow in jobs.
  const sheetId = parsed.type === "catalogue.changed" ? undefined : parsed.sheetId;
  trx.executionPromise.then(() => invalidateLibrary({ vendorId: parsed.vendorId, sheetId })).catch(() => undefined);
}
