import { formatDateTime } from "@/components/support/ticket-badges";
import { ticketPriorityLabels, ticketStatusLabels, type TicketPriority, type TicketStatus } from "@/content-schema/ticket-status";
import { describeAuditAction } from "@/lib/audit/action-labels";
import type { TicketHistoryEntry } from "@/lib/tickets/list-ticket-history";

const name = (names: Record<string, string>, id: unknown) => (typeof id === "string" ? (names[id] ?? "a former member") : "nobody");

function describe(e: TicketHistoryEntry, people: Record<string, string>): string {
  const { from, to } = e.details as { from?: unknown; to?: unknown };
  switch (e.action) {
    case "ticket.create":
      return "opened the ticket";
    case "ticket.status":
      return `status ${ticketStatusLabels[from as TicketStatus] ?? from} → ${ticketStatusLabels[to as TicketStatus] ?? to}${e.details.via ? ` (${e.details.via})` : ""}`;
    case "ticket.priority":
      return `priority ${ticketPriorityLabels[from as TicketPriority] ?? from} → ${ticketPriorityLabels[to as TicketPriority] ?? to}`;
    case "ticket.assignee":
      return `assignee ${name(people, from)} → ${name(people, to)}`;
    case "ticket.tags":
      return `tags ${(to as string[] | undefined)?.join(", ") || "none"}`;
    case "ticket.rating":
      return `rated ${String(e.details.satisfaction)}/5`;
    case "ticket.handoff":
      return "handed a problem to engineering";
    default:
      return describeAuditAction(e.action, e.details).toLowerCase();
  }
}

/** Who changed what and when, from the audit log. */
export function TicketHistory({ entries, people }: { entries: TicketHistoryEntry[]; people: Record<string, string> }) {
  return (
    <details className="text-sm">
      <summary className="cursor-pointer font-semibold">History ({entries.length})</summary>
      <ol className="mt-2 space-y-1">
        {entries.map((e) => (
          <li key={e.id}>
            <span className="text-stone-600">{formatDateTime(e.createdAt)}</span> · {e.actorName ?? "System"}: {describe(e, people)}
          </li>
        ))}
      </ol>
    </details>
  );
}
