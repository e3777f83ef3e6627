"use client";

import {
  flexRender,
  getCoreRowModel,
  getSortedRowModel,
  useReactTable,
  type RowSelectionState,
  type SortingState,
} from "@tanstack/react-table";
import { useMemo, useState, useTransition } from "react";

import type { FormAction } from "@/lib/actions/action-state";
import type { QueueFilters } from "@/lib/desk/queue-filters";
import { queueSearch, type QueuePage } from "@/lib/desk/queue-page";
import type { DeskView } from "@/lib/desk/saved-views";
import { viewCountLabel } from "@/lib/desk/view-count";
import { useDeskQueue, useDeskViews } from "@/lib/swr/use-desk-queue";
import type { TicketSummary } from "@/lib/tickets/ticket-types";

import { queueColumns } from "./queue-columns";
import { QueueFilterBar } from "./queue-filter-bar";
import { QueuePager } from "./queue-pager";
import { SaveViewForm } from "./save-view-form";

type Option = { id: string; name: string };
type Props = {
  vendor: string;
  initial: QueuePage<TicketSummary>;
  initialFilters?: QueueFilters;
  views: DeskView[];
  assignees: Option[];
  materials: Option[];
  bulkAssignAction: FormAction;
  saveViewAction: FormAction;
};

export function QueueTable({
  vendor,
  initial,
  initialFilters = {},
  views: initialViews,
  assignees,
  materials,
  bulkAssignAction,
  saveViewAction,
}: Props) {
  const [filters, setFiltersState] = useState<QueueFilters>(initialFilters);
  const [page, setPage] = useState(initial.page);
  const [initialSearch] = useState(() => queueSearch(initialFilters, initial.page));
  const [activeView, setActiveView] = useState(queueSearch(initialFilters, 1) ? "" : "open");
  // Filters and page live in the address, so a reload, the back button and a shared link keep them.
  const show = (nextFilters: QueueFilters, nextPage: number) => {
    setFiltersState(nextFilters);
    setPage(nextPage);
    setSelection({});
    const search = queueSearch(nextFilters, nextPage);
    window.history.replaceState(null, "", `${window.location.pathname}${search ? `?${search}` : ""}`);
  };
  // Other filters are another list: it starts on its first page.
  const setFilters = (next: QueueFilters) => show(next, 1);
  const [sorting, setSorting] = useState<SortingState>([]);
  const [selection, setSelection] = useState<RowSelectionState>({});
  const [assignTo, setAssignTo] = useState("");
  const [message, setMessage] = useState<string | null>(null);
  const [pending, startTransition] = useTransition();
  const isInitial = queueSearch(filters, page) === initialSearch;
  const queue = useDeskQueue(vendor, filters, page, isInitial ? initial : undefined);
  const views = useDeskViews(vendor, initialViews);
  const data = useMemo(() => queue.data?.tickets ?? [], [queue.data]);
  const columns = useMemo(() => queueColumns(vendor), [vendor]);
  const table = useReactTable({
    data,
    columns,
    state: { sorting, rowSelection: selection },
    getRowId: (t) => t.id,
    onSortingChange: setSorting,
    onRowSelectionChange: setSelection,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
  });
  const selectedIds = Object.keys(selection).filter((id) => selection[id]);

  function assign() {
    const form = new FormData();
    form.set("vendor", vendor);
    form.set("assigneeId", assignTo);
    for (const id of selectedIds) form.append("ticketIds", id);
    startTransition(async () => {
      const result = await bulkAssignAction({ ok: false }, form);
      setMessage(result.message ?? null);
      setSelection({});
      await Promise.all([queue.mutate(), views.mutate()]);
    });
  }

  return (
    <div className="space-y-4">
      <nav aria-label="Views" className="flex flex-wrap gap-2">
        {(views.data?.views ?? []).map((v) => (
          <button
            key={v.id}
            type="button"
            aria-pressed={activeView === v.id}
            onClick={() => {
              setActiveView(v.id);
              setFilters(v.filters);
            }}
            className="min-h-9 rounded border border-stone-300 bg-white px-3 text-sm aria-pressed:bg-stone-800 aria-pressed:text-white"
          >
            {v.name} <span className="num">({viewCountLabel(v.count)})</span>
          </button>
        ))}
      </nav>
      <QueueFilterBar
        filters={filters}
        onChange={(f) => {
          setFilters(f);
          setActiveView("");
        }}
        assignees={assignees}
        materials={materials}
      />
      <SaveViewForm saveViewAction={saveViewAction} vendor={vendor} filters={filters} onSaved={() => void views.mutate()} />
      <div className="flex flex-wrap items-center gap-2 text-sm" role="group" aria-label="Bulk actions">
        <span className="num">{selectedIds.length} selected</span>
        <select
          aria-label="Assign selected to"
          className="min-h-9 rounded border border-stone-300 bg-white px-2"
          value={assignTo}
          onChange={(e) => setAssignTo(e.target.value)}
        >
          <option value="">Nobody (unassign)</option>
          {assignees.map((a) => (
            <option key={a.id} value={a.id}>
              {a.name}
            </option>
          ))}
        </select>
        <button
          type="button"
          disabled={!selectedIds.length || pending}
          onClick={assign}
          className="min-h-9 rounded bg-accent px-3 font-medium text-accent-ink disabled:opacity-50"
        >
          Assign selected
        </button>
        {message ? (
          <span role="status" className="text-green-800">
            ✓ {message}
          </span>
        ) : null}
        {queue.error ? (
          <span role="alert" className="text-red-800">
            ⚠ The queue could not be refreshed.
          </span>
        ) : null}
      </div>
      <div className="overflow-x-auto rounded-lg border border-stone-200 bg-white">
        <table className="w-full text-left text-sm" aria-label="Ticket queue">
          <thead className="bg-stone-100 text-stone-700">
            {table.getHeaderGroups().map((hg) => (
              <tr key={hg.id}>
                {hg.headers.map((h) => (
                  <th
                    key={h.id}
                    className="px-2 py-2 whitespace-nowrap"
                    aria-sort={
                      h.column.getIsSorted() === "asc" ? "ascending" : h.column.getIsSorted() === "desc" ? "descending" : undefined
                    }
                  >
                    {h.column.getCanSort() ? (
                      <button type="button" onClick={h.column.getToggleSortingHandler()} className="font-semibold">
                        {flexRender(h.column.columnDef.header, h.getContext())}
                        <span aria-hidden>{h.column.getIsSorted() === "asc" ? " ▲" : h.column.getIsSorted() === "desc" ? " ▼" : ""}</span>
                      </button>
                    ) : (
                      flexRender(h.column.columnDef.header, h.getContext())
                    )}
                  </th>
                ))}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr
                key={row.id}
                data-ticket-id={row.original.id}
                className={`border-t border-stone-100 ${row.original.overdue ? "bg-red-50" : ""}`}
              >
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className="px-2 py-2">
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>
            ))}
            {data.length === 0 ? (
              <tr>
                <td colSpan={columns.length} className="px-3 py-6 text-center text-stone-600">
                  No tickets match these filters.
                </td>
              </tr>
            ) : null}
          </tbody>
        </table>
      </div>
      <QueuePager
        page={queue.data?.page ?? page}
        pageSize={queue.data?.pageSize ?? initial.pageSize}
        shown={data.length}
        hasMore={queue.data?.hasMore ?? false}
        onPage={(next) => show(filters, next)}
      />
    </div>
  );
}
