import Link from "next/link";

import { customerReplyAction, rateTicketAction } from "@/app/[vendor]/(customer)/support/actions";
import { CustomerReplyForm } from "@/components/support/customer-reply-form";
import { RatingForm } from "@/components/support/rating-form";
import { SafeMarkdown } from "@/components/support/safe-markdown";
import { ThreadFold } from "@/components/support/thread-fold";
import { formatDateTime, StatusBadge } from "@/components/support/ticket-badges";
import { AttachmentList, TicketThreadView } from "@/components/support/ticket-thread";
import { PageHeader } from "@/components/ui/page-header";
import { ticketThreadQuerySchema } from "@/content-schema/api-queries";
import { requirePageAccess } from "@/lib/auth/page-access";
import { toCustomerThread } from "@/lib/tickets/customer-view";
import { getTicketThread } from "@/lib/tickets/get-ticket-thread";

export const metadata = { title: "Ticket" };

type Props = {
  params: Promise<{ vendor: string; ticket: string }>;
  searchParams: Promise<Record<string, string | string[] | undefined>>;
};

export default async function CustomerTicketPage({ params, searchParams }: Props) {
  const { vendor: slug, ticket: ticketId } = await params;
  const { messages: fold } = ticketThreadQuerySchema.parse(await searchParams);
  const { vendor, user } = await requirePageAccess(slug, "support.use", `/${slug}/support`);
  const { ticket, messages, earlierCount, attachments, links } = toCustomerThread(
    await getTicketThread({ vendorId: vendor.id, ticketId, messages: fold, viewer: { kind: "customer", userId: user!.id } }),
  );
  return (
    <>
      <PageHeader
        title={ticket.subject}
        lead={
          <>
            Ticket <span className="num">#{ticket.number}</span> · opened {formatDateTime(ticket.createdAt)}
          </>
        }
        actions={<StatusBadge status={ticket.status} />}
      />
      <div className="grid gap-6 lg:grid-cols-[1fr_18rem]">
        <div className="space-y-6">
          <article className="rounded-lg border border-stone-200 bg-stone-50 p-4" aria-label="Your question">
            <SafeMarkdown source={ticket.body} />
            <AttachmentList vendorSlug={vendor.slug} attachments={attachments.filter((a) => !a.messageId)} />
          </article>
          <ThreadFold
            threadPath={`/${vendor.slug}/support/tickets/${ticket.id}`}
            messages={fold}
            shown={messages.length}
            earlierCount={earlierCount}
          />
          <TicketThreadView vendorSlug={vendor.slug} messages={messages} attachments={attachments} />
          {ticket.status === "closed" ? (
            <RatingForm rateTicketAction={rateTicketAction} vendor={vendor.slug} ticketId={ticket.id} current={ticket.satisfaction} />
          ) : null}
          <section aria-labelledby="reply-heading">
            <h2 id="reply-heading" className="mb-2 text-lg font-semibold">
              {ticket.status === "closed" ? "Reopen with a reply" : "Reply"}
            </h2>
            <CustomerReplyForm customerReplyAction={customerReplyAction} vendor={vendor.slug} ticketId={ticket.id} />
          </section>
        </div>
        <aside className="space-y-4 text-sm">
          {ticket.machineName ? (
            <p>
              Machine: <strong>{ticket.machineName}</strong>
            </p>
          ) : null}
          {ticket.materialName ? (
            <p>
              Material: <strong>{ticket.materialName}</strong>
            </p>
          ) : null}
          {links.length ? (
            <div>
              <h2 className="font-semibold">Linked sheets</h2>
              <ul className="mt-1 space-y-1">
                {links.map((l) => (
                  <li key={l.sheetVersionId}>
                    <Link className="underline" href={`/${vendor.slug}/library/${l.sheetSlug}/v/${l.versionNumber}`}>
                      {l.title} <span className="num">v{l.versionNumber}</span>
                    </Link>
                  </li>
                ))}
              </ul>
            </div>
          ) : null}
          {ticket.satisfaction ? (
            <p>
              Your rating: <span className="num">{ticket.satisfaction}/5</span>
            </p>
          ) : null}
        </aside>
      </div>
    </>
  );
}
