"use client";

import type { QueueFilters } from "@/lib/desk/queue-filters";
import { queueSearch, type QueuePage } from "@/lib/desk/queue-page";
import type { DeskView } from "@/lib/desk/saved-views";
import type { TicketSummary } from "@/lib/tickets/ticket-types";

import { useApiJson } from "./use-api-json";

/** A page of the Desk queue for some filters, refreshed every 10 s so new tickets appear without a reload. */
export function useDeskQueue(vendor: string, filters: QueueFilters, page: number, fallback?: QueuePage<TicketSummary>) {
  const url = `/api/v1/vendors/${vendor}/tickets?${queueSearch(filters, page)}`;
  return useApiJson<QueuePage<TicketSummary>>(url, { refreshInterval: 10_000, fallbackData: fallback, keepPreviousData: true });
}

/** Built-in and saved views with live counts. */
export function useDeskViews(vendor: string, fallback?: DeskView[]) {
  return useApiJson<{ views: DeskView[] }>(`/api/v1/vendors/${vendor}/tickets/views`, {
    refreshInterval: 15_000,
    fallbackData: fallback ? { views: fallback } : undefined,
  });
}
