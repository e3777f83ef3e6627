import { handoffAction, staffReplyAction, updateTicketAction } from "@/app/[vendor]/(staff)/desk/actions";
import { CustomerPanel } from "@/components/desk/customer-panel";
import { DeskThread } from "@/components/desk/desk-thread";
import { HandoffForm } from "@/components/desk/handoff-form";
import { ReplyEditor } from "@/components/desk/reply-editor";
import { TicketControls } from "@/components/desk/ticket-controls";
import { TicketHistory } from "@/components/desk/ticket-history";
import { SafeMarkdown } from "@/components/support/safe-markdown";
import { DueBadge, formatDateTime, PriorityBadge, StatusBadge } from "@/components/support/ticket-badges";
import { AttachmentList } from "@/components/support/ticket-thread";
import { PageHeader } from "@/components/ui/page-header";
import { ticketThreadQuerySchema } from "@/content-schema/api-queries";
import { requirePageAccess } from "@/lib/auth/page-access";
import { getCustomerContext } from "@/lib/desk/customer-context";
import { listAssignees } from "@/lib/desk/desk-options";
import { findPickerVersions, listPickerVersionsById } from "@/lib/desk/picker-versions";
import { listSnippets } from "@/lib/desk/snippets";
import { getTicketThread } from "@/lib/tickets/get-ticket-thread";
import { listTicketHistory } from "@/lib/tickets/list-ticket-history";

export const metadata = { title: "Ticket · Desk" };

type Props = {
  params: Promise<{ vendor: string; ticket: string }>;
  searchParams: Promise<Record<string, string | string[] | undefined>>;
};

export default async function DeskTicketPage({ params, searchParams }: Props) {
  const { vendor: slug, ticket: ticketId } = await params;
  const { messages } = ticketThreadQuerySchema.parse(await searchParams);
  const { vendor, user } = await requirePageAccess(slug, "desk.use", `/${slug}/desk`);
  const thread = await getTicketThread({ vendorId: vendor.id, ticketId, messages, viewer: { kind: "staff" } });
  const { ticket, links, attachments } = thread;
  const [context, assignees, firstVersions, linkedPickerVersions, snippets, history] = await Promise.all([
    getCustomerContext({ vendorId: vendor.id, customerId: ticket.customerId, excludeTicketId: ticket.id }),
    listAssignees({ vendorId: vendor.id }),
    findPickerVersions({ vendorId: vendor.id, q: "" }),
    listPickerVersionsById({ vendorId: vendor.id, ids: links.map((l) => l.sheetVersionId) }),
    listSnippets({ vendorId: vendor.id }),
    listTicketHistory({ vendorId: vendor.id, ticketId: ticket.id }),
  ]);
  const people = Object.fromEntries(assignees.map((a) => [a.id, a.name]));
  const linkedVersions = links.map((l) => ({ id: l.sheetVersionId, name: `${l.title} (v${l.versionNumber})` }));
  const placeholders = {
    "customer.name": ticket.customerName,
    "ticket.number": String(ticket.number),
    "ticket.subject": ticket.subject,
    "agent.name": user!.name || user!.email,
    "machine.name": ticket.machineName ?? context.machines[0]?.name,
    "sheet.title": links[0]?.title,
    "vendor.name": vendor.name,
  };
  return (
    <>
      <PageHeader
        title={ticket.subject}
        lead={
          <>
            Ticket <span className="num">#{ticket.number}</span> from {ticket.customerName} (
            <span className="num">{ticket.customerEmail}</span>) · {formatDateTime(ticket.createdAt)}
          </>
        }
        actions={
          <div className="flex items-center gap-3">
            <StatusBadge status={ticket.status} />
            <PriorityBadge priority={ticket.priority} />
            <DueBadge dueAt={ticket.firstResponseDueAt} respondedAt={ticket.firstResponseAt} overdue={ticket.overdue} />
          </div>
        }
      />
      <div className="grid gap-6 xl:grid-cols-[1fr_20rem]">
        <div className="space-y-6">
          <article className="rounded-lg border border-stone-200 bg-stone-50 p-4" aria-label="Customer's question">
            <SafeMarkdown source={ticket.body} />
            <AttachmentList vendorSlug={vendor.slug} attachments={attachments.filter((a) => !a.messageId)} />
          </article>
          <DeskThread vendor={vendor.slug} messages={messages} initial={thread} />
          <ReplyEditor
            staffReplyAction={staffReplyAction}
            vendor={vendor.slug}
            ticketId={ticket.id}
            firstVersions={firstVersions}
            linkedVersions={linkedPickerVersions}
            machines={context.machines.map((m) => ({ id: m.id, name: m.name }))}
            defaultMachineId={ticket.machineId}
            defaultVersionId={links[0]?.sheetVersionId ?? null}
            snippets={snippets}
            placeholders={placeholders}
          />
        </div>
        <aside className="space-y-6">
          <section aria-labelledby="settings-h">
            <h2 id="settings-h" className="mb-2 font-semibold">
              Ticket
            </h2>
            <TicketControls updateTicketAction={updateTicketAction} vendor={vendor.slug} ticket={ticket} assignees={assignees} />
          </section>
          <CustomerPanel vendorSlug={vendor.slug} context={context} links={links} ticket={ticket} />
          <section aria-labelledby="handoff-h">
            <h2 id="handoff-h" className="mb-2 font-semibold">
              Engineering
            </h2>
            <HandoffForm handoffAction={handoffAction} vendor={vendor.slug} ticketId={ticket.id} versions={linkedVersions} />
          </section>
          <TicketHistory entries={history} people={people} />
        </aside>
      </div>
    </>
  );
}
