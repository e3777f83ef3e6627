"use client";

import type { ThreadMessages } from "@/content-schema/api-queries";
import type { TicketThread } from "@/lib/tickets/ticket-types";

import { useApiJson } from "./use-api-json";

/**
 * One ticket's thread, polled so a reply from a colleague or the customer shows up without a reload. Asks for the
 * same fold as the page, so a long thread stays a bounded answer.
 */
export function useTicketThread(vendor: string, ticketId: string, messages: ThreadMessages, fallback: TicketThread) {
  const query = messages === "all" ? "?messages=all" : "";
  return useApiJson<TicketThread>(`/api/v1/vendors/${vendor}/tickets/${ticketId}${query}`, {
    refreshInterval: 10_000,
    fallbackData: fallback,
  });
}
