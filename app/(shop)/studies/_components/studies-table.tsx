"use client";

import { createColumnHelper, type ColumnDef } from "@tanstack/react-table";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useMemo } from "react";
import { dateTimeText } from "@/model/dates";
import { EmptyState } from "../../../_ui/empty-state";
import { FormNotice } from "../../../_ui/field";
import { errorText } from "../../../_ui/query/fetch";
import { useShopTimeZone } from "../../../_ui/query/settings/use-shop-settings";
import { exportStudyUrl } from "../../../_ui/query/studies/fetchers";
import { useStudies, useStudyActions } from "../../../_ui/query/studies/use-studies";
import type { StudyRow } from "../../../_ui/query/types";
import { DataTable } from "../../../_ui/table/data-table";
import { changedColumn, nameColumn } from "../../../_ui/table/row-columns";
import { TableToolbar } from "../../../_ui/table/table-toolbar";
import { useServerTable } from "../../../_ui/table/use-server-table";

const h = createColumnHelper<StudyRow>();

/** The shop's studies: sorted, filtered and paged on the server; archived ones behind a switch. */
export function StudiesTable({ onProblem, onNew }: { onProblem: (t: string | null) => void; onNew: () => void }) {
  const t = useServerTable({ sort: "updatedAt", dir: "desc" });
  const list = useStudies(t.params);
  const columns = useStudyColumns(onProblem);
  const filtered = Boolean(t.params.q) || t.archived;
  return (
    <div className="flex flex-col gap-3">
      <TableToolbar filter={t.filter} onFilter={t.setFilter} archived={t.archived} onArchived={t.setArchived} />
      {list.isError ? <FormNotice tone="error">The studies could not be loaded: {errorText(list.error)}</FormNotice> : null}
      <DataTable<StudyRow>
        label="Studies"
        testId="table-studies"
        data={list.data?.items ?? []}
        columns={columns}
        loading={list.isPending}
        getRowId={(r) => r.id}
        server={{ rowCount: list.data?.total ?? 0, sorting: t.sorting, onSortingChange: t.setSorting, pagination: t.pagination, onPaginationChange: t.setPagination }}
        empty={filtered ? <EmptyState title="No studies match">Clear the filter{t.archived ? " or switch off “Archived only”" : ""} to see every study.</EmptyState> : <NoStudiesYet onNew={onNew} />}
      />
    </div>
  );
}

/** The table's columns: name, case, kits, whether a kit is chosen, when it changed, and its actions. */
function useStudyColumns(onProblem: (t: string | null) => void) {
  const router = useRouter();
  const { duplicate, archive } = useStudyActions((text) => onProblem(text));
  const zone = useShopTimeZone();
  return useMemo<ColumnDef<StudyRow, unknown>[]>(
    () =>
      [
        nameColumn<StudyRow>("Study", (r) => `/studies/${r.id}`),
        h.accessor((r) => r.caseName ?? "", { id: "caseName", header: "Case profile" }),
        h.display({ id: "kits", header: "Kits", enableSorting: false, cell: ({ row }) => <span className="num">{row.original.kitIds.length}</span> }),
        h.display({
          id: "choice",
          header: "Choice made",
          enableSorting: false,
          cell: ({ row }) => (row.original.chosenKitId ? <span className="text-success">✓ yes</span> : <span className="text-ink-3">not yet</span>),
        }),
        changedColumn<StudyRow>((at) => dateTimeText(at, zone)),
        h.display({
          id: "actions",
          header: () => <span className="sr-only">Actions</span>,
          cell: ({ row }) => {
            const s = row.original;
            return (
              <div className="flex flex-wrap justify-end gap-2">
                <button
                  type="button"
                  className="btn-quiet"
                  disabled={duplicate.isPending}
                  onClick={() => {
                    onProblem(null);
                    duplicate.mutate(s.id, { onSuccess: (copy) => router.push(`/studies/${copy.id}`) });
                  }}
                >
                  Duplicate
                </button>
                <a className="btn-quiet no-underline" href={exportStudyUrl(s.id)} download>
                  Export
                </a>
                <button
                  type="button"
                  className="btn-quiet"
                  onClick={() => {
                    onProblem(null);
                    archive.mutate({ id: s.id, archived: !s.archivedAt });
                  }}
                >
                  {s.archivedAt ? "Restore" : "Archive"}
                </button>
              </div>
            );
          },
        }),
      ] as ColumnDef<StudyRow, unknown>[],
    [duplicate, archive, onProblem, router, zone],
  );
}

function NoStudiesYet({ onNew }: { onNew: () => void }) {
  return (
    <EmptyState
      title="No studies yet"
      action={
        <div className="flex gap-2">
          <button type="button" className="btn" onClick={onNew}>
            New study
          </button>
          <Link href="/library" className="btn-quiet no-underline">
            Go to the library
          </Link>
        </div>
      }
    >
      A study puts one case profile against one or more candidate kits. Add the case and the kits to the library first, then start a study here — or
      import a study file.
    </EmptyState>
  );
}
