"use client";

import {
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getPaginationRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnDef,
  type SortingState,
} from "@tanstack/react-table";
import { useState, type ReactNode } from "react";

type Props<T> = { data: T[]; columns: ColumnDef<T, unknown>[]; label: string; empty: ReactNode; pageSize?: number };

const SORT_MARK = { asc: " ▲", desc: " ▼" } as const;

/** A compact staff table: click a header to sort, type to filter, page through long lists. */
export function DataTable<T>({ data, columns, label, empty, pageSize = 25 }: Props<T>) {
  const [sorting, setSorting] = useState<SortingState>([]);
  const [filter, setFilter] = useState("");
  const table = useReactTable({
    data,
    columns,
    state: { sorting, globalFilter: filter },
    onSortingChange: setSorting,
    onGlobalFilterChange: setFilter,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
    getPaginationRowModel: getPaginationRowModel(),
    initialState: { pagination: { pageSize } },
  });
  if (data.length === 0) return <>{empty}</>;
  const rows = table.getRowModel().rows;
  const { pageIndex } = table.getState().pagination;
  return (
    <div>
      <label className="mb-3 flex max-w-sm flex-col gap-1 text-sm font-medium">
        Filter {label}
        <input
          type="search"
          value={filter}
          onChange={(e) => setFilter(e.target.value)}
          className="min-h-11 rounded border border-stone-300 bg-white px-3 py-2 font-normal"
        />
      </label>
      <div className="overflow-x-auto rounded-md border border-stone-300 bg-white">
        <table className="w-full border-collapse text-sm" aria-label={label}>
          <thead className="bg-stone-100">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  return (
                    <th
                      key={header.id}
                      scope="col"
                      aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : undefined}
                      className="border-b border-stone-300 px-3 py-2 text-left font-semibold"
                    >
                      {header.isPlaceholder ? null : header.column.getCanSort() ? (
                        <button type="button" onClick={header.column.getToggleSortingHandler()} className="font-semibold hover:underline">
                          {flexRender(header.column.columnDef.header, header.getContext())}
                          {sorted ? SORT_MARK[sorted] : ""}
                        </button>
                      ) : (
                        flexRender(header.column.columnDef.header, header.getContext())
                      )}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {rows.length === 0 ? (
              <tr>
                <td colSpan={columns.length} className="px-3 py-6 text-center text-stone-600">
                  Nothing matches “{filter}”.
                </td>
              </tr>
            ) : (
              rows.map((row) => (
                <tr key={row.id} className="border-b border-stone-200 last:border-0 hover:bg-stone-50">
                  {row.getVisibleCells().map((cell) => (
                    <td key={cell.id} className="px-3 py-2 align-top">
                      {flexRender(cell.column.columnDef.cell, cell.getContext())}
                    </td>
                  ))}
                </tr>
              ))
            )}
          </tbody>
        </table>
      </div>
      {table.getPageCount() > 1 ? (
        <div className="mt-3 flex items-center gap-3 text-sm">
          <button
            type="button"
            onClick={() => table.previousPage()}
            disabled={!table.getCanPreviousPage()}
            className="min-h-11 rounded border border-stone-300 bg-white px-3 disabled:opacity-50"
          >
            Previous
          </button>
          <span className="num">
            Page {pageIndex + 1} of {table.getPageCount()}
          </span>
          <button
            type="button"
            onClick={() => table.nextPage()}
            disabled={!table.getCanNextPage()}
            className="min-h-11 rounded border border-stone-300 bg-white px-3 disabled:opacity-50"
          >
            Next
          </button>
        </div>
      ) : null}
    </div>
  );
}
