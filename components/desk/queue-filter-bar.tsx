"use client";

import { TICKET_PRIORITIES, TICKET_STATUSES, ticketPriorityLabels, ticketStatusLabels } from "@/content-schema/ticket-status";
import { QUEUE_SORTS, queueSortLabels, type QueueFilters } from "@/lib/desk/queue-filters";

type Option = { id: string; name: string };
type Props = { filters: QueueFilters; onChange: (f: QueueFilters) => void; assignees: Option[]; materials: Option[] };

const sel = "min-h-9 rounded border border-stone-300 bg-white px-2 text-sm";

export function QueueFilterBar({ filters, onChange, assignees, materials }: Props) {
  const set = (patch: Partial<QueueFilters>) => onChange({ ...filters, ...patch });
  return (
    <div className="flex flex-wrap items-end gap-3 text-sm" role="group" aria-label="Filters">
      <label className="flex flex-col">
        Search
        <input
          type="search"
          className={`${sel} w-56`}
          value={filters.q ?? ""}
          onChange={(e) => set({ q: e.target.value || undefined })}
          placeholder="Ticket number or words"
        />
      </label>
      <label className="flex flex-col">
        Status
        <select
          className={sel}
          value={filters.status?.[0] ?? ""}
          onChange={(e) => set({ status: e.target.value ? [e.target.value as (typeof TICKET_STATUSES)[number]] : undefined })}
        >
          <option value="">Open (not closed)</option>
          {TICKET_STATUSES.map((s) => (
            <option key={s} value={s}>
              {ticketStatusLabels[s]}
            </option>
          ))}
        </select>
      </label>
      <label className="flex flex-col">
        Priority
        <select
          className={sel}
          value={filters.priority?.[0] ?? ""}
          onChange={(e) => set({ priority: e.target.value ? [e.target.value as (typeof TICKET_PRIORITIES)[number]] : undefined })}
        >
          <option value="">Any</option>
          {TICKET_PRIORITIES.map((p) => (
            <option key={p} value={p}>
              {ticketPriorityLabels[p]}
            </option>
          ))}
        </select>
      </label>
      <label className="flex flex-col">
        Assignee
        <select
          className={sel}
          value={filters.assignee ?? ""}
          onChange={(e) => set({ assignee: (e.target.value || undefined) as QueueFilters["assignee"] })}
        >
          <option value="">Anyone</option>
          <option value="me">Me</option>
          <option value="none">Unassigned</option>
          {assignees.map((a) => (
            <option key={a.id} value={a.id}>
              {a.name}
            </option>
          ))}
        </select>
      </label>
      <label className="flex flex-col">
        Material
        <select className={sel} value={filters.materialId ?? ""} onChange={(e) => set({ materialId: e.target.value || undefined })}>
          <option value="">Any</option>
          {materials.map((m) => (
            <option key={m.id} value={m.id}>
              {m.name}
            </option>
          ))}
        </select>
      </label>
      <label className="flex flex-col">
        Tag
        <input
          className={sel}
          value={filters.tag ?? ""}
          onChange={(e) => set({ tag: e.target.value.trim().toLowerCase() || undefined })}
          placeholder="e.g. melting"
        />
      </label>
      <label className="flex flex-col">
        Order
        <select
          className={sel}
          value={filters.sort ?? "newest"}
          onChange={(e) => set({ sort: e.target.value === "newest" ? undefined : (e.target.value as QueueFilters["sort"]) })}
        >
          {QUEUE_SORTS.map((s) => (
            <option key={s} value={s}>
              {queueSortLabels[s]}
            </option>
          ))}
        </select>
      </label>
      <label className="flex min-h-9 items-center gap-2">
        <input type="checkbox" checked={Boolean(filters.overdue)} onChange={(e) => set({ overdue: e.target.checked || undefined })} />{" "}
        Overdue only
      </label>
    </div>
  );
}
