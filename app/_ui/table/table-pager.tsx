"use client";

import type { Table } from "@tanstack/react-table";

/** "Rows 21–40 of 57", page back and forth, page size. Hidden when everything fits on one page. */
export function TablePager<T>({ table, total }: { table: Table<T>; total: number }) {
  const { pageIndex, pageSize } = table.getState().pagination;
  const from = total === 0 ? 0 : pageIndex * pageSize + 1;
  const to = Math.min(total, (pageIndex + 1) * pageSize);
  const pages = Math.max(1, Math.ceil(total / pageSize));
  return (
    <div className="flex flex-wrap items-center justify-between gap-2 text-sm text-ink-2">
      <span className="num" aria-live="polite">
        {from}–{to} of {total}
      </span>
      <div className="flex items-center gap-2">
        <label className="flex items-center gap-1">
          <span>Per page</span>
          <select
            className="rounded-md border border-rule bg-card px-2 py-1 num"
            value={pageSize}
            onChange={(e) => table.setPagination({ pageIndex: 0, pageSize: Number(e.target.value) })}
          >
            {[10, 20, 50, 100].map((n) => (
              <option key={n} value={n}>
                {n}
              </option>
            ))}
          </select>
        </label>
        <button type="button" className="btn-quiet" onClick={() => table.previousPage()} disabled={pageIndex === 0}>
          Previous
        </button>
        <span className="num">
          {pageIndex + 1} / {pages}
        </span>
        <button type="button" className="btn-quiet" onClick={() => table.nextPage()} disabled={pageIndex + 1 >= pages}>
          Next
        </button>
      </div>
    </div>
  );
}
