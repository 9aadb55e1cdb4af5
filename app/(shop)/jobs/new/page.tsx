import type { Metadata } from "next";
import { listStudies } from "@/db/studies";
import { SHOP_STAFF } from "@/db/roles";
import { listQuerySchema } from "@/model/schemas";
import { requirePage } from "../../../_ui/guard";
import { NewJobForm } from "../_components/new-job-form";

export const metadata: Metadata = { title: "New job" };

/** Opens a job: the customer, the engine, and the study the plan comes from. */
export default async function NewJobPage({ searchParams }: { searchParams: Promise<{ studyId?: string }> }) {
  const caller = await requirePage("/jobs/new", SHOP_STAFF);
  const { studyId } = await searchParams;
  const studies = await listStudies(caller, listQuerySchema("studies").parse({ pageSize: 100 }));
  return (
    <div className="flex max-w-3xl flex-col gap-6">
      <h1 className="text-3xl font-semibold">New job</h1>
      <NewJobForm studies={studies.items.map((s) => ({ id: s.id, name: s.name, kitIds: s.kitIds, chosenKitId: s.chosenKitId }))} initialStudyId={studyId ?? ""} isOwner={caller.role === "owner"} />
    </div>
  );
}
