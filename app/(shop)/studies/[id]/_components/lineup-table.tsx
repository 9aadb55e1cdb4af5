"use client";

import type { LengthUnits } from "@/geometry";
import { useMemo } from "react";
import { EmptyState } from "../../../../_ui/empty-state";
import { DataTable } from "../../../../_ui/table/data-table";
import { lineupColumns } from "./lineup-columns";
import type { LineupRow } from "./lineup-rows";

/** All kits of the study side by side, sortable, with one marked as the choice. */
export function LineupTable({ rows, units, chosen, onChoose }: { rows: LineupRow[]; units: LengthUnits; chosen: string; onChoose: (kitId: string) => void }) {
  const columns = useMemo(() => lineupColumns(units, chosen, onChoose), [units, chosen, onChoose]);
  return (
    <DataTable<LineupRow>
      label="Lineup"
      testId="lineup"
      data={rows}
      columns={columns}
      getRowId={(r) => r.kitId}
      pageSize={50}
      rowClassName={(r) => (r.original.kitId === chosen ? "bg-accent-soft/50" : "")}
      empty={<EmptyState title="No kits in this study">Add candidate kits on the left to compare them here.</EmptyState>}
    />
  );
}
