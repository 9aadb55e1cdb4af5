import type { LibraryKind } from "../../../_ui/query/types";

/** The library kind named in an address, or null. */
export function libraryKind(raw: string | undefined): LibraryKind | null {
  return raw === "cases" || raw === "kits" || raw === "rigs" ? raw : null;
}
