"use client";

import { TicketThreadView } from "@/components/support/ticket-thread";
import { useTicketThread } from "@/lib/swr/use-ticket-thread";
import type { TicketThread } from "@/lib/tickets/ticket-types";

/** The staff view of the thread (notes included), refreshed while the page is open. */
export function DeskThread({ vendor, initial }: { vendor: string; initial: TicketThread }) {
  const { data } = useTicketThread(vendor, initial.ticket.id, initial);
  const thread = data ?? initial;
  return <TicketThreadView vendorSlug={vendor} messages={thread.messages} attachments={thread.attachments} />;
}
