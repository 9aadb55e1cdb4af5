"use client";

import type { Column } from "@tanstack/react-table";
import type { ReactNode } from "react";

/** A column header that sorts on click and says which way it sorts. */
export function SortHeader<T>({ column, children }: { column: Column<T, unknown>; children: ReactNode }) {
  const dir = column.getIsSorted();
  return (
    <button
      type="button"
      onClick={column.getToggleSortingHandler()}
      className="inline-flex items-center gap-1 font-medium text-ink-2 hover:text-ink"
      title={dir === "asc" ? "Sorted low to high; click to reverse" : dir === "desc" ? "Sorted high to low; click to reverse" : "Click to sort"}
    >
      {children}
      <span aria-hidden="true" className={dir ? "text-accent" : "text-ink-3"}>
        {dir === "asc" ? "▲" : dir === "desc" ? "▼" : "↕"}
      </span>
    </button>
  );
}
