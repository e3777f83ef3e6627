import { z } from "zod";

import { queueFiltersSchema, queueFiltersToSearch, type QueueFilters } from "./queue-filters";

/** Tickets on one page of the Desk queue. */
export const QUEUE_PAGE_SIZE = 50;
/** Paging stops here (an offset this deep is slow, and filters find a ticket sooner). */
export const QUEUE_MAX_PAGE = 200;

/** The page of the queue, from the query string: page 1 for anything that is not a page number. */
export const queuePageSchema = z.coerce.number().int().min(1).max(QUEUE_MAX_PAGE).catch(1);

/** The queue's query string: filters and page, as the Desk page and the tickets API read them. */
export const queueQuerySchema = queueFiltersSchema.extend({ page: queuePageSchema.optional() });

export function parseQueuePage(input: unknown): number {
  return queuePageSchema.parse(Array.isArray(input) ? input[0] : (input ?? 1));
}

/** Filters and page as a query string, for the SWR key and the address bar; page 1 is left out. */
export function queueSearch(filters: QueueFilters, page: number): string {
  const p = new URLSearchParams(queueFiltersToSearch(filters));
  if (page > 1) p.set("page", String(page));
  return p.toString();
}

/** One page of the queue: its tickets and whether another page follows. */
export type QueuePage<T> = { tickets: T[]; page: number; pageSize: number; hasMore: boolean };
