import { ticketPriorityLabels, ticketStatusLabels, type TicketPriority, type TicketStatus } from "@/content-schema/ticket-status";
import { formatDateTime } from "@/lib/ui/dates";

const STATUS_STYLE: Record<TicketStatus, { icon: string; className: string }> = {
  new: { icon: "●", className: "border-sky-700 text-sky-900 bg-sky-50" },
  in_progress: { icon: "◐", className: "border-stone-500 text-stone-800 bg-stone-50" },
  waiting_on_customer: { icon: "…", className: "border-amber-700 text-amber-900 bg-amber-50" },
  answered: { icon: "✓", className: "border-green-700 text-green-900 bg-green-50" },
  closed: { icon: "■", className: "border-stone-400 text-stone-600 bg-white" },
};

export function StatusBadge({ status }: { status: TicketStatus }) {
  const s = STATUS_STYLE[status];
  return (
    <span
      data-status={status}
      className={`inline-flex items-center gap-1 rounded border px-2 py-0.5 text-xs font-medium whitespace-nowrap ${s.className}`}
    >
      <span aria-hidden>{s.icon}</span>
      {ticketStatusLabels[status]}
    </span>
  );
}

export function PriorityBadge({ priority }: { priority: TicketPriority }) {
  const strong = priority === "urgent" || priority === "high";
  return (
    <span className={`text-xs whitespace-nowrap ${strong ? "font-semibold text-red-800" : "text-stone-600"}`}>
      {strong ? <span aria-hidden>▲ </span> : null}
      {ticketPriorityLabels[priority]}
    </span>
  );
}

export { formatDateTime };

/** The first-response target: when it is due, or that it is overdue (never colour alone). */
export function DueBadge({ dueAt, respondedAt, overdue }: { dueAt: string; respondedAt: string | null; overdue: boolean }) {
  if (respondedAt) return <span className="text-xs text-stone-600">Answered {formatDateTime(respondedAt)}</span>;
  if (overdue)
    return (
      <span data-overdue="true" className="text-xs font-semibold text-red-800">
        <span aria-hidden>⚠ </span>Overdue since {formatDateTime(dueAt)}
      </span>
    );
  return <span className="text-xs text-stone-700">Due {formatDateTime(dueAt)}</span>;
}
