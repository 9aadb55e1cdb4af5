"use client";

import type { RowBase } from "../../../_ui/query/types";

/** Archive or restore, and delete (asked twice; the server refuses when a study uses the row and names it). */
export function RowActions({
  row,
  onArchive,
  onDelete,
  busy,
}: {
  row: RowBase;
  onArchive: (archived: boolean) => void;
  onDelete: () => void;
  busy: boolean;
}) {
  return (
    <div className="flex justify-end gap-2">
      <button type="button" className="btn-quiet" disabled={busy} onClick={() => onArchive(!row.archivedAt)}>
        {row.archivedAt ? "Restore" : "Archive"}
      </button>
      <button
        type="button"
        className="btn-quiet text-error"
        disabled={busy}
        onClick={() => {
          if (window.confirm(`Delete “${row.name}” for good? Archiving keeps it out of the way and can be undone.`)) onDelete();
        }}
      >
        Delete
      </button>
    </div>
  );
}
