import type { LibraryKind, ListParams } from "../types";

/** Query keys of the library: invalidate `all` after a CSV import, `lists(kind)` after any write of that kind. */
export const libraryKeys = {
  all: ["library"] as const,
  kind: (kind: LibraryKind) => [...libraryKeys.all, kind] as const,
  lists: (kind: LibraryKind) => [...libraryKeys.kind(kind), "list"] as const,
  list: (kind: LibraryKind, params: ListParams) => [...libraryKeys.lists(kind), params] as const,
  details: (kind: LibraryKind) => [...libraryKeys.kind(kind), "detail"] as const,
  detail: (kind: LibraryKind, id: string) => [...libraryKeys.details(kind), id] as const,
};
