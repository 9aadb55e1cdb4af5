"use client";

import { useMutation, useQueryClient, type QueryClient } from "@tanstack/react-query";
import { errorText } from "../fetch";
import type { LibraryKind, Page, RowBase, RowOf } from "../types";
import { createLibraryRow, deleteLibraryRow, setLibraryArchived, updateLibraryRow } from "./fetchers";
import { libraryKeys } from "./keys";

type Snapshot = [readonly unknown[], Page<RowBase> | undefined][];

/** Takes every cached list of a kind out of the way and edits them in place; returns what to put back. */
async function editLists(qc: QueryClient, kind: LibraryKind, edit: (page: Page<RowBase>) => Page<RowBase>): Promise<Snapshot> {
  await qc.cancelQueries({ queryKey: libraryKeys.lists(kind) });
  const snapshot = qc.getQueriesData<Page<RowBase>>({ queryKey: libraryKeys.lists(kind) });
  for (const [key, page] of snapshot) if (page) qc.setQueryData(key, edit(page));
  return snapshot;
}

function restore(qc: QueryClient, snapshot: Snapshot | undefined) {
  for (const [key, page] of snapshot ?? []) qc.setQueryData(key, page);
}

/**
 * Archive, restore and delete, shown at once in every list of the kind and rolled back with the server's
 * words when it refuses (a delete refused because studies use the row names them).
 */
export function useLibraryRowActions(kind: LibraryKind, onProblem: (text: string) => void) {
  const qc = useQueryClient();
  const settle = () => qc.invalidateQueries({ queryKey: libraryKeys.kind(kind) });

  const archive = useMutation({
    mutationFn: ({ id, archived }: { id: string; archived: boolean }) => setLibraryArchived(kind, id, archived),
    onMutate: ({ id }) => editLists(qc, kind, (p) => ({ ...p, items: p.items.filter((r) => r.id !== id), total: Math.max(0, p.total - 1) })),
    onError: (error, _v, snapshot) => {
      restore(qc, snapshot);
      onProblem(errorText(error));
    },
    onSettled: settle,
  });

  const remove = useMutation({
    mutationFn: ({ id }: { id: string }) => deleteLibraryRow(kind, id),
    onMutate: ({ id }) => editLists(qc, kind, (p) => ({ ...p, items: p.items.filter((r) => r.id !== id), total: Math.max(0, p.total - 1) })),
    onError: (error, _v, snapshot) => {
      restore(qc, snapshot);
      onProblem(errorText(error));
    },
    onSettled: settle,
  });

  return { archive, remove };
}

/** Create or update one row; on success the row's cache is set and the lists refetch. */
export function useSaveLibraryRow<K extends LibraryKind>(kind: K, id: string | null) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: unknown): Promise<RowOf<K>> => (id ? updateLibraryRow(kind, id, body) : createLibraryRow(kind, body)),
    onSuccess: (row) => {
      qc.setQueryData(libraryKeys.detail(kind, row.id), row);
      void qc.invalidateQueries({ queryKey: libraryKeys.lists(kind) });
    },
  });
}
