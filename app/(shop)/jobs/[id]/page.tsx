import type { Metadata } from "next";
import { shopTimeZone } from "@/db/settings";
import { dateTimeText } from "@/model/dates";
import { quoteFor } from "@/db/jobs";
import { SHOP_STAFF } from "@/db/roles";
import { requirePage } from "../../../_ui/guard";
import { jobPageData } from "../_components/job-page-data";
import { PlanVerdict } from "../_components/plan-verdict";
import { AfterCut } from "./_components/after-cut";
import { JobActions } from "./_components/job-actions";
import { JobHeading } from "./_components/job-heading";
import { JobHistory } from "./_components/job-history";
import { JobSummary } from "./_components/job-summary";
import { Photos } from "./_components/photos";
import { QuoteSection } from "./_components/quote-section";

export const metadata: Metadata = { title: "Job" };

/** One job: its status and moves, the plan against what was cut, the readings form, photos and history. */
export default async function JobPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const caller = await requirePage(`/jobs/${id}`, SHOP_STAFF);
  const { detail, photos } = await jobPageData(caller, id, "job page");
  const { job, plan } = detail;
  const quote = await quoteFor(caller, id);
  const kit = plan ? plan.result.kits.find((k) => k.kitId === plan.kitId) : undefined;
  const zone = shopTimeZone();
  const when = (at: string) => dateTimeText(at, zone);
  return (
    <div className="flex flex-col gap-6">
      <JobHeading job={job} hasPlan={plan !== null} />
      {kit ? <PlanVerdict kit={kit} job={job} /> : null}
      <JobActions job={job} role={caller.role} hasPlan={plan !== null} />
      <JobSummary job={job} plan={plan} kit={kit} units={caller.units} when={when} />
      <QuoteSection job={job} data={quote} role={caller.role} when={when} />
      {job.approval ? (
        <p className="text-sm text-ink-2" data-testid="approval">
          Approved by {job.approval.by.name} on {when(job.approval.at)}{job.approval.reason ? ` — ${job.approval.reason}` : ""}.
        </p>
      ) : null}
      <AfterCut detail={detail} role={caller.role} zone={zone} />
      <Photos jobId={job.id} canEdit initial={photos} />
      <JobHistory detail={detail} when={when} />
    </div>
  );
}
