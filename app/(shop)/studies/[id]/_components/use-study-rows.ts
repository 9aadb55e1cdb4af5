"use client";

import { useQueries } from "@tanstack/react-query";
import { fetchLibraryRow } from "../../../../_ui/query/library/fetchers";
import { libraryKeys } from "../../../../_ui/query/library/keys";
import { useLibraryRow } from "../../../../_ui/query/library/use-library-row";
import type { KitRow } from "../../../../_ui/query/types";

/** The library rows the study is built from: its case, each kit (in order) and the rig. Stable between renders. */
export function useStudyRows(caseId: string, kitIds: string[], rigId: string) {
  const caseRow = useLibraryRow("cases", caseId);
  const kits = useQueries({
    queries: kitIds.map((id) => ({ queryKey: libraryKeys.detail("kits", id), queryFn: () => fetchLibraryRow("kits", id), staleTime: 60_000 })),
    // combine's result is shared structurally, so the list keeps its identity while nothing changed.
    combine: (results) => ({
      rows: results.map((r) => r.data).filter((k): k is KitRow => Boolean(k)),
      pending: results.some((r) => r.isPending),
      error: results.find((r) => r.isError)?.error ?? null,
    }),
  });
  const rigRow = useLibraryRow("rigs", rigId || null);
  const loading = caseRow.isPending || kits.pending || (Boolean(rigId) && rigRow.isPending);
  const failed = caseRow.error ?? kits.error ?? (rigId ? rigRow.error : null) ?? null;
  return { caseRow: caseRow.data ?? null, kitRows: kits.rows, rigRow: rigId ? (rigRow.data ?? null) : null, loading, failed };
}
