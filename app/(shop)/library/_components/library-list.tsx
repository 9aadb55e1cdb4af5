"use client";

import type { LengthUnits } from "@/geometry";
import type { ColumnDef } from "@tanstack/react-table";
import Link from "next/link";
import { useMemo, useState } from "react";
import { EmptyState } from "../../../_ui/empty-state";
import { FormNotice } from "../../../_ui/field";
import { errorText } from "../../../_ui/query/fetch";
import { useLibraryList } from "../../../_ui/query/library/use-library-list";
import { useLibraryRowActions } from "../../../_ui/query/library/use-library-mutations";
import type { LibraryKind, RowBase } from "../../../_ui/query/types";
import { DataTable } from "../../../_ui/table/data-table";
import { TableToolbar } from "../../../_ui/table/table-toolbar";
import { useServerTable } from "../../../_ui/table/use-server-table";
import { caseColumns, kitColumns, rigColumns } from "./columns";
import { KIND_WORDS } from "./library-tabs";
import { RowActions } from "./row-actions";

const EMPTY_TEXT: Record<LibraryKind, string> = {
  cases:
    "A case profile describes one crankcase variant: the mouth read with calipers (the smallest reading counts), the studs, the deck outline and the transfer passages. Add the first one, or import several from a CSV file below.",
  kits: "A cylinder kit is a candidate for a case: bore, skirt readings taken on the part (the largest counts), skirt length, studs, gaskets and price. Add one, or import a CSV file below.",
  rigs: "A boring rig is the tool that makes the cut: head diameter, the bit's calibrated reach, the stop grooves and the shims at hand. Add the rig you use to get its set-up in every study.",
};

/** The columns the API sorts by (any other sort field is refused). */
const SORTABLE: Record<LibraryKind, string[]> = {
  cases: ["name", "updatedAt", "stockBoreMm", "strokeMm"],
  kits: ["name", "updatedAt", "boreMm", "price"],
  rigs: ["name", "updatedAt", "headDiameterMm"],
};

/** One shelf of the library as a table that sorts, filters and pages on the server. */
/** `timeZone`: the shop's, for the dates in the table. */
export function LibraryList({ kind, units, timeZone }: { kind: LibraryKind; units: LengthUnits; timeZone: string }) {
  const t = useServerTable({ sort: "name" });
  const list = useLibraryList(kind, t.params);
  const [problem, setProblem] = useState<string | null>(null);
  const { archive, remove } = useLibraryRowActions(kind, setProblem);
  const words = KIND_WORDS[kind];

  const columns = useMemo(() => {
    const base = (kind === "cases" ? caseColumns(units, timeZone) : kind === "kits" ? kitColumns(units, timeZone) : rigColumns(units, timeZone)) as ColumnDef<RowBase, unknown>[];
    const actions: ColumnDef<RowBase, unknown> = {
      id: "actions",
      header: () => <span className="sr-only">Actions</span>,
      enableSorting: false,
      cell: ({ row }) => (
        <RowActions
          row={row.original}
          busy={archive.isPending || remove.isPending}
          onArchive={(archived) => {
            setProblem(null);
            archive.mutate({ id: row.original.id, archived });
          }}
          onDelete={() => {
            setProblem(null);
            remove.mutate({ id: row.original.id });
          }}
        />
      ),
    };
    return [...base.map((c) => ({ ...c, enableSorting: SORTABLE[kind].includes(c.id ?? "") })), actions];
  }, [kind, units, timeZone, archive, remove]);

  const filtered = Boolean(t.params.q) || t.archived;
  const addLink = (
    <Link href={`/library/${kind}/new`} className="btn no-underline">
      Add a {words.one}
    </Link>
  );

  return (
    <div className="flex flex-col gap-4">
      <TableToolbar filter={t.filter} onFilter={t.setFilter} archived={t.archived} onArchived={t.setArchived}>
        {addLink}
      </TableToolbar>
      {problem ? <FormNotice tone="error">{problem}</FormNotice> : null}
      {list.isError ? <FormNotice tone="error">The {words.plural} could not be loaded: {errorText(list.error)}</FormNotice> : null}
      <DataTable<RowBase>
        label={words.tab}
        testId={`table-${kind}`}
        data={list.data?.items ?? []}
        columns={columns}
        loading={list.isPending}
        getRowId={(r) => r.id}
        server={{
          rowCount: list.data?.total ?? 0,
          sorting: t.sorting,
          onSortingChange: t.setSorting,
          pagination: t.pagination,
          onPaginationChange: t.setPagination,
        }}
        empty={
          filtered ? (
            <EmptyState title={`No ${words.plural} match`}>
              {t.archived ? "No archived rows match this filter. " : "Nothing matches this filter. "}Clear the filter{t.archived ? " or switch off “Archived only”" : ""} to see the
              whole shelf.
            </EmptyState>
          ) : (
            <EmptyState title={`No ${words.plural} yet`} action={addLink}>
              {EMPTY_TEXT[kind]}
            </EmptyState>
          )
        }
      />
    </div>
  );
}
