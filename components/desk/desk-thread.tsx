"use client";

import { ThreadFold } from "@/components/support/thread-fold";
import { TicketThreadView } from "@/components/support/ticket-thread";
import type { ThreadMessages } from "@/content-schema/api-queries";
import { useTicketThread } from "@/lib/swr/use-ticket-thread";
import type { TicketThread } from "@/lib/tickets/ticket-types";

/** The staff view of the thread (notes included), refreshed while the page is open. */
export function DeskThread({ vendor, messages, initial }: { vendor: string; messages: ThreadMessages; initial: TicketThread }) {
  const { data } = useTicketThread(vendor, initial.ticket.id, messages, initial);
  const thread = data ?? initial;
  return (
    <>
      <ThreadFold
        threadPath={`/${vendor}/desk/tickets/${thread.ticket.id}`}
        messages={messages}
        shown={thread.messages.length}
        earlierCount={thread.earlierCount}
      />
      <TicketThreadView vendorSlug={vendor} messages={thread.messages} attachments={thread.attachments} />
    </>
  );
}
