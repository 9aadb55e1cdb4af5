"use client";

import { createColumnHelper } from "@tanstack/react-table";
import Link from "next/link";
import type { RowBase } from "../query/types";

// The two columns every list of the shop's rows opens and closes with: the row's name as a link, marked when
// archived, and when it last changed and who made it.

/** The row's name, linking to its page, with an "archived" mark. Sorts by "name". */
export function nameColumn<T extends RowBase>(header: string, href: (row: T) => string) {
  return createColumnHelper<T>().accessor((r) => r.name, {
    id: "name",
    header,
    cell: (c) => (
      <span className="flex items-center gap-2">
        <Link href={href(c.row.original)} className="font-medium text-accent">
          {c.getValue()}
        </Link>
        {c.row.original.archivedAt ? <span className="rounded bg-paper-2 px-1.5 text-xs text-ink-2">archived</span> : null}
      </span>
    ),
  });
}

/** When the row last changed (written by `at`, from model/dates.ts) and who made it. Sorts by "updatedAt". */
export function changedColumn<T extends RowBase>(at: (iso: string) => string) {
  return createColumnHelper<T>().accessor((r) => r.updatedAt, {
    id: "updatedAt",
    header: "Changed",
    cell: (c) => (
      <span className="text-ink-2">
        {at(c.getValue())} <span className="text-ink-3">· {c.row.original.createdBy?.name}</span>
      </span>
    ),
  });
}
