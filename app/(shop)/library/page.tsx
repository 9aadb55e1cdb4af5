import type { Metadata } from "next";
import { SHOP_STAFF } from "@/db/roles";
import { shopTimeZone } from "@/db/settings";
import { FormNotice } from "../../_ui/field";
import { requirePage } from "../../_ui/guard";
import { QueryProvider } from "../../_ui/query/provider";
import type { LibraryKind } from "../../_ui/query/types";
import { CsvPanel } from "./_components/csv-panel";
import { LibraryList } from "./_components/library-list";
import { LibraryTabs } from "./_components/library-tabs";
import { libraryKind } from "./_components/kind";

export const metadata: Metadata = { title: "Library" };

export default async function LibraryPage({ searchParams }: { searchParams: Promise<{ kind?: string; saved?: string }> }) {
  const caller = await requirePage("/library", SHOP_STAFF);
  const { kind: raw, saved } = await searchParams;
  const kind: LibraryKind = libraryKind(raw) ?? "cases";
  return (
    <div className="flex flex-col gap-6">
      <div>
        <h1 className="text-3xl font-semibold">Library</h1>
        <p className="mt-1 max-w-prose text-ink-2">The shop&apos;s case profiles, cylinder kits and boring rigs — what every study is built from.</p>
      </div>
      <LibraryTabs active={kind} />
      {saved ? <FormNotice tone="ok">Saved “{saved}”.</FormNotice> : null}
      <QueryProvider>
        {/* Keyed by kind: sorting, paging and filter belong to one shelf and start afresh on another. */}
        <LibraryList key={kind} kind={kind} units={caller.units} timeZone={shopTimeZone()} />
        {kind !== "rigs" ? <CsvPanel kind={kind} /> : null}
      </QueryProvider>
    </div>
  );
}
