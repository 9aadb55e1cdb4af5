"use client";

import type { ReactNode } from "react";

/** Above a table: a filter box, an optional "show archived" switch, and the table's own commands. */
export function TableToolbar({
  filter,
  onFilter,
  filterLabel = "Filter by name",
  archived,
  onArchived,
  children,
}: {
  filter: string;
  onFilter: (text: string) => void;
  filterLabel?: string;
  archived?: boolean;
  onArchived?: (on: boolean) => void;
  children?: ReactNode;
}) {
  return (
    <div className="flex flex-wrap items-end justify-between gap-3">
      <div className="flex flex-wrap items-end gap-4">
        <label className="block">
          <span className="field-label">{filterLabel}</span>
          <input type="search" className="field-input w-64" value={filter} onChange={(e) => onFilter(e.target.value)} placeholder="Type part of a name" />
        </label>
        {onArchived ? (
          <label className="flex items-center gap-2 pb-2 text-sm">
            <input type="checkbox" checked={Boolean(archived)} onChange={(e) => onArchived(e.target.checked)} />
            Archived only
          </label>
        ) : null}
      </div>
      <div className="flex flex-wrap gap-2">{children}</div>
    </div>
  );
}
