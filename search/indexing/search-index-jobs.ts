import "server-only";

import type { Knex } from "knex";
import { z } from "zod";

import type { SheetEvent, SheetEventSubscriber } from "@/lib/events/sheet-events";
import { enqueue } from "@/lib/jobs/enqueue";
import { getSearchEngine } from "@/search/engines/choose-engine";

import { reindexCatalogueEntry, reindexSheets, reindexVendor } from "./reindex";

export const SEARCH_REINDEX_VENDOR_QUEUE = "search.reindex-vendor";

/** Runs inside the event delivery job: a failing engine throws, and the job retries until it is back. */
export async function indexSheetEvent(event: SheetEvent): Promise<void> {
  const engine = getSearchEngine();
  if (event.type === "catalogue.changed") {
    await reindexCatalogueEntry({ engine, vendorId: event.vendorId, entity: event.entity, entityId: event.entityId });
  } else {
    await reindexSheets({ engine, vendorId: event.vendorId, sheetIds: [event.sheetId] });
  }
}

export const searchIndexSubscriber: SheetEventSubscriber = { name: "search-index", handle: indexSheetEvent };

const vendorJob = z.object({ vendorId: z.uuid() });

export async function reindexVendorJob(data: unknown): Promise<void> {
  await reindexVendor({ engine: getSearchEngine(), vendorId: vendorJob.parse(data).vendorId });
}

export const enqueueVendorReindex = (trx: Knex | Knex.Transaction, vendorId: string) =>
  enqueue(trx, SEARCH_REINDEX_VENDOR_QUEUE, { vendorId });
