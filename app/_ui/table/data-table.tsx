"use client";

import {
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getPaginationRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnDef,
  type OnChangeFn,
  type PaginationState,
  type Row,
  type SortingState,
} from "@tanstack/react-table";
import { useState, type ReactNode } from "react";
import { SortHeader } from "./sort-header";
import { TablePager } from "./table-pager";

export type ServerSide = {
  /** Rows matching the filter on the server (for the pager). */
  rowCount: number;
  sorting: SortingState;
  onSortingChange: OnChangeFn<SortingState>;
  pagination: PaginationState;
  onPaginationChange: OnChangeFn<PaginationState>;
};

type Props<T> = {
  /** What the table lists, for screen readers ("Case profiles"). */
  label: string;
  data: T[];
  // eslint-disable-next-line @typescript-eslint/no-explicit-any -- column value types differ per column
  columns: ColumnDef<T, any>[];
  /** Sorting, filtering and paging done by the server; without it they are done here. */
  server?: ServerSide;
  /** Client-side text filter (ignored with `server`). */
  filter?: string;
  initialSorting?: SortingState;
  pageSize?: number;
  /** What to show when there are no rows: what the list holds and what to do. */
  empty: ReactNode;
  loading?: boolean;
  getRowId?: (row: T) => string;
  rowClassName?: (row: Row<T>) => string;
  testId?: string;
};

/** A table that sorts, filters and pages — on the server for long lists, in the browser for short ones. */
export function DataTable<T>({ label, data, columns, server, filter, initialSorting, pageSize = 20, empty, loading, getRowId, rowClassName, testId }: Props<T>) {
  const [sorting, setSorting] = useState<SortingState>(initialSorting ?? []);
  const [pagination, setPagination] = useState<PaginationState>({ pageIndex: 0, pageSize });
  const table = useReactTable({
    data,
    columns,
    getRowId,
    state: server
      ? { sorting: server.sorting, pagination: server.pagination }
      : { sorting, pagination, globalFilter: filter ?? "" },
    onSortingChange: server ? server.onSortingChange : setSorting,
    onPaginationChange: server ? server.onPaginationChange : setPagination,
    manualSorting: Boolean(server),
    manualPagination: Boolean(server),
    manualFiltering: Boolean(server),
    rowCount: server?.rowCount,
    enableSortingRemoval: false,
    // Low to high on the first click, for every column (thinnest wall first, cheapest first).
    sortDescFirst: false,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: server ? undefined : getSortedRowModel(),
    getFilteredRowModel: server ? undefined : getFilteredRowModel(),
    getPaginationRowModel: server ? undefined : getPaginationRowModel(),
    autoResetPageIndex: !server,
  });
  const rows = table.getRowModel().rows;
  const total = server ? server.rowCount : table.getFilteredRowModel().rows.length;

  if (!loading && total === 0) return <>{empty}</>;

  return (
    <div className="flex flex-col gap-2" data-testid={testId}>
      {/* relative: the table's visually hidden labels (absolutely placed) stay inside the scroll box, not beside the page. */}
      <div className="card relative overflow-x-auto">
        <table className="w-full border-collapse text-sm" aria-label={label} aria-busy={loading || undefined}>
          <thead className="bg-paper-2/70 text-left">
            {table.getHeaderGroups().map((hg) => (
              <tr key={hg.id}>
                {hg.headers.map((h) => (
                  <th
                    key={h.id}
                    scope="col"
                    className="border-b border-rule px-3 py-2 font-medium text-ink-2 whitespace-nowrap"
                    aria-sort={h.column.getIsSorted() === "asc" ? "ascending" : h.column.getIsSorted() === "desc" ? "descending" : undefined}
                  >
                    {h.isPlaceholder ? null : h.column.getCanSort() ? (
                      <SortHeader column={h.column}>{flexRender(h.column.columnDef.header, h.getContext())}</SortHeader>
                    ) : (
                      flexRender(h.column.columnDef.header, h.getContext())
                    )}
                  </th>
                ))}
              </tr>
            ))}
          </thead>
          <tbody>
            {rows.map((row) => (
              <tr key={row.id} className={`border-b border-rule last:border-b-0 hover:bg-paper-2/40 ${rowClassName?.(row) ?? ""}`}>
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className="px-3 py-2 align-top">
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>
            ))}
            {loading && rows.length === 0 ? (
              <tr>
                <td colSpan={columns.length} className="px-3 py-6 text-center text-ink-3">
                  Loading…
                </td>
              </tr>
            ) : null}
          </tbody>
        </table>
      </div>
      <TablePager table={table} total={total} />
    </div>
  );
}
