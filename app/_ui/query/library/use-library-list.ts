"use client";

import { keepPreviousData, useQuery } from "@tanstack/react-query";
import type { LibraryKind, ListParams } from "../types";
import { fetchLibraryList } from "./fetchers";
import { libraryKeys } from "./keys";

/** One page of a library table, keeping the previous page on screen while the next loads. */
export function useLibraryList<K extends LibraryKind>(kind: K, params: ListParams) {
  return useQuery({
    queryKey: libraryKeys.list(kind, params),
    queryFn: () => fetchLibraryList(kind, params),
    placeholderData: keepPreviousData,
  });
}

/** Every (non-archived) row of a kind for a picker, up to the API's page limit. */
export function useLibraryOptions<K extends LibraryKind>(kind: K) {
  const params: ListParams = { page: 1, pageSize: 100, sort: "name", dir: "asc" };
  return useQuery({ queryKey: libraryKeys.list(kind, params), queryFn: () => fetchLibraryList(kind, params) });
}
