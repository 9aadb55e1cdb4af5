"use client";

import { useQuery } from "@tanstack/react-query";
import type { LibraryKind } from "../types";
import { fetchLibraryRow } from "./fetchers";
import { libraryKeys } from "./keys";

/** One library row; disabled while there is no id. */
export function useLibraryRow<K extends LibraryKind>(kind: K, id: string | null | undefined) {
  return useQuery({
    queryKey: libraryKeys.detail(kind, id ?? ""),
    queryFn: () => fetchLibraryRow(kind, id ?? ""),
    enabled: Boolean(id),
  });
}
