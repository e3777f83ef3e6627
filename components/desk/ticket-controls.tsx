"use client";

import { useActionState } from "react";

import { updateTicketAction } from "@/app/[vendor]/(staff)/desk/actions";
import { FormMessage } from "@/components/forms/form-message";
import { SubmitButton } from "@/components/forms/submit-button";
import { TICKET_PRIORITIES, TICKET_STATUSES, ticketPriorityLabels, ticketStatusLabels } from "@/content-schema/ticket-status";
import { initialActionState } from "@/lib/actions/action-state";
import type { TicketDetail } from "@/lib/tickets/ticket-types";

const field = "min-h-9 w-full rounded border border-stone-300 bg-white px-2";

export function TicketControls({ vendor, ticket, assignees }: { vendor: string; ticket: TicketDetail; assignees: { id: string; name: string }[] }) {
  const [state, action] = useActionState(updateTicketAction, initialActionState);
  return (
    <form action={action} className="space-y-3 text-sm" aria-label="Ticket settings">
      <input type="hidden" name="vendor" value={vendor} />
      <input type="hidden" name="ticketId" value={ticket.id} />
      {/* What the page showed: only fields the agent changed are applied, so a stale page never reverts a newer change. */}
      <input type="hidden" name="was" value={JSON.stringify({ status: ticket.status, priority: ticket.priority, assigneeId: ticket.assigneeId ?? "", tags: ticket.tags.join(", ") })} />
      <label className="block">Status
        <select name="status" defaultValue={ticket.status} className={field}>
          {TICKET_STATUSES.map((s) => <option key={s} value={s}>{ticketStatusLabels[s]}</option>)}
        </select>
      </label>
      <label className="block">Priority
        <select name="priority" defaultValue={ticket.priority} className={field}>
          {TICKET_PRIORITIES.map((p) => <option key={p} value={p}>{ticketPriorityLabels[p]}</option>)}
        </select>
      </label>
      <label className="block">Assignee
        <select name="assigneeId" defaultValue={ticket.assigneeId ?? ""} className={field}>
          <option value="">Unassigned</option>
          {assignees.map((a) => <option key={a.id} value={a.id}>{a.name}</option>)}
        </select>
      </label>
      <label className="block">Tags (comma separated)
        <input name="tags" defaultValue={ticket.tags.join(", ")} className={field} />
      </label>
      <FormMessage state={state} success={state.message} />
      <SubmitButton variant="quiet">Save changes</SubmitButton>
    </form>
  );
}
