"use client";

import type { ColumnDef } from "@tanstack/react-table";
import Link from "next/link";

import { DataTable } from "@/components/catalogue/data-table";
import { EmptyState } from "@/components/ui/empty-state";
import type { DraftingSheetRow } from "@/lib/sheets/list-drafting-sheets";

import { StateBadge } from "./state-badge";

export function SheetsTable({ vendorSlug, sheets }: { vendorSlug: string; sheets: DraftingSheetRow[] }) {
  const columns: ColumnDef<DraftingSheetRow, unknown>[] = [
    {
      accessorKey: "title",
      header: "Sheet",
      cell: ({ row }) => (
        <Link className="font-medium underline" href={`/${vendorSlug}/drafting/sheets/${row.original.slug}`}>
          {row.original.title}
        </Link>
      ),
    },
    { accessorKey: "cutterSku", header: "Cutter", cell: ({ row }) => <span className="num">{row.original.cutterSku}</span> },
    { accessorKey: "materialName", header: "Material" },
    { accessorKey: "machineClassName", header: "Machine class" },
    {
      accessorKey: "latestState",
      header: "Latest version",
      cell: ({ row }) => (
        <span className="whitespace-nowrap">
          <span className="num">v{row.original.latestNumber}</span> <StateBadge state={row.original.latestState} />
        </span>
      ),
    },
    {
      accessorKey: "publishedNumber",
      header: "Published",
      cell: ({ row }) => <span className="num">{row.original.publishedNumber ? `v${row.original.publishedNumber}` : "—"}</span>,
    },
    {
      accessorKey: "updatedAt",
      header: "Changed",
      cell: ({ row }) => <span className="num whitespace-nowrap">{row.original.updatedAt.slice(0, 10)}</span>,
    },
  ];
  return (
    <DataTable
      data={sheets}
      columns={columns}
      label="sheets"
      empty={<EmptyState title="No sheets yet">Start one with “New sheet”.</EmptyState>}
    />
  );
}
