"use client";

import { queueFiltersToSearch, type QueueFilters } from "@/lib/desk/queue-filters";
import type { DeskView } from "@/lib/desk/saved-views";
import type { TicketSummary } from "@/lib/tickets/ticket-types";

import { useApiJson } from "./use-api-json";

/** The Desk queue for some filters, refreshed every 10 s so new tickets appear without a reload. */
export function useDeskQueue(vendor: string, filters: QueueFilters, fallback?: TicketSummary[]) {
  const url = `/api/v1/vendors/${vendor}/tickets?${queueFiltersToSearch(filters)}`;
  return useApiJson<{ tickets: TicketSummary[] }>(url, {
    refreshInterval: 10_000,
    fallbackData: fallback ? { tickets: fallback } : undefined,
    keepPreviousData: true,
  });
}

/** Built-in and saved views with live counts. */
export function useDeskViews(vendor: string, fallback?: DeskView[]) {
  return useApiJson<{ views: DeskView[] }>(`/api/v1/vendors/${vendor}/tickets/views`, {
    refreshInterval: 15_000,
    fallbackData: fallback ? { views: fallback } : undefined,
  });
}
