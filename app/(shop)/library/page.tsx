import type { Metadata } from "next";
import { SHOP_STAFF } from "@/db/roles";
import { EmptyState } from "../../_ui/empty-state";
import { requirePage } from "../../_ui/guard";

export const metadata: Metadata = { title: "Library" };

export default async function LibraryPage() {
  await requirePage("/library", SHOP_STAFF);
  return (
    <div className="flex flex-col gap-6">
      <h1 className="text-3xl font-semibold">Library</h1>
      <EmptyState title="The library is empty">
        The shop&apos;s case profiles, cylinder kits and boring rigs live here. Add a case profile first: the mouth, the studs and the deck outline.
      </EmptyState>
    </div>
  );
}
