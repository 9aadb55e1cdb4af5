"use client";

import type { PaginationState, SortingState } from "@tanstack/react-table";
import { useDeferredValue, useState } from "react";
import type { ListParams } from "../query/types";

/** The state of a server-side table (sort, page, filter, archived) and the list parameters it asks for. */
export function useServerTable(initial: { sort: string; dir?: "asc" | "desc"; pageSize?: number }) {
  const [sorting, setSorting] = useState<SortingState>([{ id: initial.sort, desc: initial.dir === "desc" }]);
  const [pagination, setPagination] = useState<PaginationState>({ pageIndex: 0, pageSize: initial.pageSize ?? 20 });
  const [filter, setFilterText] = useState("");
  const [archived, setArchivedFlag] = useState(false);
  const q = useDeferredValue(filter.trim());
  const params: ListParams = {
    page: pagination.pageIndex + 1,
    pageSize: pagination.pageSize,
    sort: sorting[0]?.id ?? initial.sort,
    dir: sorting[0]?.desc ? "desc" : "asc",
    q: q || undefined,
    archived,
  };
  const setFilter = (text: string) => {
    setFilterText(text);
    setPagination((p) => ({ ...p, pageIndex: 0 }));
  };
  const setArchived = (on: boolean) => {
    setArchivedFlag(on);
    setPagination((p) => ({ ...p, pageIndex: 0 }));
  };
  return { sorting, setSorting, pagination, setPagination, filter, setFilter, archived, setArchived, params };
}
