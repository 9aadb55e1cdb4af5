import type { Metadata } from "next";
import { SHOP_STAFF } from "@/db/roles";
import { EmptyState } from "../../_ui/empty-state";
import { requirePage } from "../../_ui/guard";

export const metadata: Metadata = { title: "Jobs" };

export default async function JobsPage() {
  await requirePage("/jobs", SHOP_STAFF);
  return (
    <div className="flex flex-col gap-6">
      <h1 className="text-3xl font-semibold">Jobs</h1>
      <EmptyState title="No jobs yet">
        A job is a customer&apos;s engine on the bench: intake, plan, approval, machining, verification. Jobs start from a study.
      </EmptyState>
    </div>
  );
}
