"use client";

import { useQuery } from "@tanstack/react-query";
import type { LibraryKind, ListParams } from "../types";
import { fetchLibraryList } from "./fetchers";
import { libraryKeys } from "./keys";

/**
 * One page of a library table, keeping the previous page of the same kind on screen while the next loads.
 * A page of another kind is never kept: its rows do not have the columns of this kind.
 */
export function useLibraryList<K extends LibraryKind>(kind: K, params: ListParams) {
  return useQuery({
    queryKey: libraryKeys.list(kind, params),
    queryFn: () => fetchLibraryList(kind, params),
    placeholderData: (previous, previousQuery) => (previousQuery?.queryKey[1] === kind ? previous : undefined),
  });
}

/** Every (non-archived) row of a kind for a picker, up to the API's page limit. */
export function useLibraryOptions<K extends LibraryKind>(kind: K) {
  const params: ListParams = { page: 1, pageSize: 100, sort: "name", dir: "asc" };
  return useQuery({ queryKey: libraryKeys.list(kind, params), queryFn: () => fetchLibraryList(kind, params) });
}
