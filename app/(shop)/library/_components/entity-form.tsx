"use client";

import type { LengthUnits } from "@/geometry";
import Link from "next/link";
import { EmptyState } from "../../../_ui/empty-state";
import { ApiFailure, errorText } from "../../../_ui/query/fetch";
import { useLibraryRow } from "../../../_ui/query/library/use-library-row";
import type { CaseRow, KitRow, LibraryKind, RigRow } from "../../../_ui/query/types";
import { CaseForm } from "./case-form";
import { KitForm } from "./kit-form";
import { RigForm } from "./rig-form";
import { KIND_WORDS } from "./library-tabs";

/** Loads the row (when editing) and shows the form of its kind. */
export function EntityForm({ kind, id, units }: { kind: LibraryKind; id: string | null; units: LengthUnits }) {
  const row = useLibraryRow(kind, id);
  if (id && row.isPending) return <p className="text-ink-2">Loading…</p>;
  if (id && row.isError) {
    const missing = row.error instanceof ApiFailure && row.error.status === 404;
    return (
      <EmptyState
        title={missing ? `No such ${KIND_WORDS[kind].one}` : "It could not be loaded"}
        action={
          <Link href={`/library?kind=${kind}`} className="btn no-underline">
            Back to the library
          </Link>
        }
      >
        {missing ? "It may have been deleted, or the address is wrong." : errorText(row.error)}
      </EmptyState>
    );
  }
  const data = id ? (row.data ?? null) : null;
  const key = data ? data.id : "new";
  if (kind === "cases") return <CaseForm key={key} row={data as CaseRow | null} units={units} />;
  if (kind === "kits") return <KitForm key={key} row={data as KitRow | null} units={units} />;
  return <RigForm key={key} row={data as RigRow | null} units={units} />;
}
