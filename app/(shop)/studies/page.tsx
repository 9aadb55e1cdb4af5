import type { Metadata } from "next";
import { SHOP_STAFF } from "@/db/roles";
import { requirePage } from "../../_ui/guard";
import { QueryProvider } from "../../_ui/query/provider";
import { StudiesView } from "./_components/studies-view";

export const metadata: Metadata = { title: "Studies" };

export default async function StudiesPage() {
  await requirePage("/studies", SHOP_STAFF);
  return (
    <div className="flex flex-col gap-6">
      <div>
        <h1 className="text-3xl font-semibold">Studies</h1>
        <p className="mt-1 max-w-prose text-ink-2">One case profile against one or more candidate kits: which fit as they are, which need a cut, and which cannot be made safe.</p>
      </div>
      <QueryProvider>
        <StudiesView />
      </QueryProvider>
    </div>
  );
}
