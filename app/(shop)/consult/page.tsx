import type { Metadata } from "next";
import { EmptyState } from "../../_ui/empty-state";
import { requirePage } from "../../_ui/guard";

export const metadata: Metadata = { title: "Consult" };

export default async function ConsultPage() {
  const caller = await requirePage("/consult");
  return (
    <div className="flex flex-col gap-6">
      <h1 className="text-3xl font-semibold">Your plans at {caller.shopName}</h1>
      <EmptyState title="Nothing shared with you yet">
        When the shop shares the plan for your engine, it appears here and you receive an e-mail with a link.
      </EmptyState>
    </div>
  );
}
