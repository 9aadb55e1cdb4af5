"use client";

import { ConfirmButton } from "../../../_ui/form/confirm-button";
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
      <ConfirmButton className="btn-quiet text-error" disabled={busy} question={`Delete “${row.name}” for good? Archiving keeps it out of the way and can be undone.`} onConfirm={onDelete}>
        Delete
      </ConfirmButton>
    </div>
  );
}
