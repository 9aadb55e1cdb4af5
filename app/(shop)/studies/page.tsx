import type { Metadata } from "next";
import Link from "next/link";
import { SHOP_STAFF } from "@/db/roles";
import { EmptyState } from "../../_ui/empty-state";
import { requirePage } from "../../_ui/guard";

export const metadata: Metadata = { title: "Studies" };

export default async function StudiesPage() {
  await requirePage("/studies", SHOP_STAFF);
  return (
    <div className="flex flex-col gap-6">
      <h1 className="text-3xl font-semibold">Studies</h1>
      <EmptyState title="No studies yet" action={<Link href="/library" className="btn no-underline">Go to the library</Link>}>
        A study puts one case profile against one or more candidate kits. Start by adding the case and the kits to the library.
      </EmptyState>
    </div>
  );
}
