"use client";

import { createColumnHelper } from "@tanstack/react-table";
import Link from "next/link";

import { DueBadge, formatDateTime, PriorityBadge, StatusBadge } from "@/components/support/ticket-badges";
import { TICKET_PRIORITIES } from "@/content-schema/ticket-status";
import type { TicketSummary } from "@/lib/tickets/ticket-types";

const col = createColumnHelper<TicketSummary>();

export function queueColumns(vendor: string) {
  return [
    col.display({
      id: "select",
      header: ({ table }) => (
        <input
          type="checkbox"
          aria-label="Select all"
          checked={table.getIsAllRowsSelected()}
          onChange={table.getToggleAllRowsSelectedHandler()}
        />
      ),
      cell: ({ row }) => (
        <input
          type="checkbox"
          aria-label={`Select ticket ${row.original.number}`}
          checked={row.getIsSelected()}
          onChange={row.getToggleSelectedHandler()}
        />
      ),
    }),
    col.accessor("number", { header: "#", cell: (c) => <span className="num">{c.getValue()}</span> }),
    col.accessor("subject", {
      header: "Subject",
      cell: (c) => (
        <Link href={`/${vendor}/desk/tickets/${c.row.original.id}`} className="font-medium underline underline-offset-2">
          {c.getValue()}
        </Link>
      ),
    }),
    col.accessor("customerName", { header: "Customer" }),
    col.accessor("status", { header: "Status", cell: (c) => <StatusBadge status={c.getValue()} /> }),
    col.accessor("priority", {
      header: "Priority",
      sortingFn: (a, b) => TICKET_PRIORITIES.indexOf(a.original.priority) - TICKET_PRIORITIES.indexOf(b.original.priority),
      cell: (c) => <PriorityBadge priority={c.getValue()} />,
    }),
    col.accessor((t) => t.assigneeName ?? "", {
      id: "assignee",
      header: "Assignee",
      cell: (c) => c.getValue() || <span className="text-stone-600">Unassigned</span>,
    }),
    col.accessor("materialName", { header: "Material", cell: (c) => c.getValue() ?? "—" }),
    col.accessor("tags", { header: "Tags", enableSorting: false, cell: (c) => c.getValue().join(", ") }),
    col.accessor("firstResponseDueAt", {
      header: "First reply",
      cell: (c) => <DueBadge dueAt={c.getValue()} respondedAt={c.row.original.firstResponseAt} overdue={c.row.original.overdue} />,
    }),
    col.accessor("lastActivityAt", { header: "Last activity", cell: (c) => formatDateTime(c.getValue()) }),
  ];
}
