"use client";

import type { TicketThread } from "@/lib/tickets/ticket-types";

import { useApiJson } from "./use-api-json";

/** One ticket's thread, polled so a reply from a colleague or the customer shows up without a reload. */
export function useTicketThread(vendor: string, ticketId: string, fallback: TicketThread) {
  return useApiJson<TicketThread>(`/api/v1/vendors/${vendor}/tickets/${ticketId}`, { refreshInterval: 10_000, fallbackData: fallback });
}
