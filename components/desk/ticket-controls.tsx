"use client";

import { startTransition, useActionState, useState, type FormEvent } from "react";

import { FormMessage } from "@/components/forms/form-message";
import { TICKET_PRIORITIES, TICKET_STATUSES, ticketPriorityLabels, ticketStatusLabels } from "@/content-schema/ticket-status";
import { panelValuesOf, type TicketPanelValues } from "@/content-schema/ticket-update";
import { initialActionState, type FormAction } from "@/lib/actions/action-state";
import type { TicketDetail } from "@/lib/tickets/ticket-types";

const field = "min-h-9 w-full rounded border border-stone-300 bg-white px-2";
const KEYS = ["status", "priority", "assigneeId", "tags"] as const;

const isPanelValues = (data: unknown): data is TicketPanelValues =>
  !!data && typeof data === "object" && KEYS.every((key) => typeof (data as Record<string, unknown>)[key] === "string");

/**
 * Status, priority, assignee and tags. The panel keeps what the server last said (`shown`) apart from
 * what the agent is editing, sends only the touched fields with their shown values, and takes the saved
 * ticket back after a save, a conflict, or a refresh of the page (a reply changes the status).
 */
export function TicketControls({
  vendor,
  ticket,
  assignees,
  updateTicketAction,
}: {
  vendor: string;
  ticket: TicketDetail;
  assignees: { id: string; name: string }[];
  updateTicketAction: FormAction;
}) {
  const [state, action, pending] = useActionState(updateTicketAction, initialActionState);
  const fromServer = panelValuesOf(ticket);
  const [shown, setShown] = useState(fromServer);
  const [values, setValues] = useState(fromServer);
  const [seenServer, setSeenServer] = useState(JSON.stringify(fromServer));
  const [seenState, setSeenState] = useState(state);

  // Newer values from the page (after a reply or another agent's change) replace the fields the agent has not touched.
  const adopt = (fresh: TicketPanelValues, keepEdits: boolean) => {
    setValues(
      (current) =>
        Object.fromEntries(
          KEYS.map((key) => [key, keepEdits && current[key] !== shown[key] ? current[key] : fresh[key]]),
        ) as TicketPanelValues,
    );
    setShown(fresh);
  };
  if (JSON.stringify(fromServer) !== seenServer) {
    setSeenServer(JSON.stringify(fromServer));
    adopt(fromServer, true);
  }
  if (state !== seenState) {
    setSeenState(state);
    // A save answers with the saved ticket; a conflict answers with the current one and keeps the agent's edits.
    if (isPanelValues(state.data)) adopt(state.data, !state.ok);
  }

  const touched = KEYS.filter((key) => values[key] !== shown[key]);
  const set = (key: keyof TicketPanelValues) => (event: { target: { value: string } }) =>
    setValues((v) => ({ ...v, [key]: event.target.value }));

  function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData();
    form.set("vendor", vendor);
    form.set("ticketId", ticket.id);
    for (const key of touched) form.set(key, values[key]);
    form.set("was", JSON.stringify(Object.fromEntries(touched.map((key) => [key, shown[key]]))));
    startTransition(() => action(form));
  }

  return (
    <form onSubmit={submit} className="space-y-3 text-sm" aria-label="Ticket settings">
      <label className="block">
        Status
        <select name="status" value={values.status} onChange={set("status")} className={field}>
          {TICKET_STATUSES.map((s) => (
            <option key={s} value={s}>
              {ticketStatusLabels[s]}
            </option>
          ))}
        </select>
      </label>
      <label className="block">
        Priority
        <select name="priority" value={values.priority} onChange={set("priority")} className={field}>
          {TICKET_PRIORITIES.map((p) => (
            <option key={p} value={p}>
              {ticketPriorityLabels[p]}
            </option>
          ))}
        </select>
      </label>
      <label className="block">
        Assignee
        <select name="assigneeId" value={values.assigneeId} onChange={set("assigneeId")} className={field}>
          <option value="">Unassigned</option>
          {assignees.map((a) => (
            <option key={a.id} value={a.id}>
              {a.name}
            </option>
          ))}
        </select>
      </label>
      <label className="block">
        Tags (comma separated)
        <input name="tags" value={values.tags} onChange={set("tags")} className={field} />
      </label>
      <FormMessage state={state} success={state.message} />
      <button
        type="submit"
        disabled={pending || touched.length === 0}
        className="min-h-11 rounded border border-stone-300 bg-white px-4 py-2 font-medium text-stone-900 disabled:opacity-60"
      >
        {pending ? "Saving…" : "Save changes"}
      </button>
    </form>
  );
}
