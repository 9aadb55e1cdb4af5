import type { Metadata } from "next";
import Link from "next/link";
import { SHOP_STAFF } from "@/db/roles";
import { shopTimeZone } from "@/db/settings";
import { requirePage } from "../../../_ui/guard";
import { Photos } from "../../jobs/[id]/_components/photos";
import { PlanVsActual } from "../../jobs/[id]/_components/plan-vs-actual";
import { jobPageData } from "../../jobs/_components/job-page-data";
import { StatusBadge } from "../../jobs/_components/status-badge";
import { ConsultActions } from "./_components/consult-actions";
import { ConsultChoices } from "./_components/consult-choices";
import { ConsultCautions, ConsultPlan, ConsultPrice } from "./_components/consult-plan";
import { FitForCustomer } from "./_components/fit";

export const metadata: Metadata = { title: "Your plan" };

/** The consult page: what the customer sees of the shop — the fit, the choices in plain words, the plan, the cautions, approve, ask, pay. */
export default async function ConsultJobPage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<{ checkout?: string }> }) {
  const { id } = await params;
  const { checkout } = await searchParams;
  const caller = await requirePage(`/consult/${id}`);
  if (SHOP_STAFF.includes(caller.role)) return <StaffVisit id={id} />;
  const { detail, photos } = await jobPageData(caller, id, "consult page");
  const { job, plan, readings } = detail;
  const chosen = plan?.result.kits.find((k) => k.kitId === plan.kitId);
  return (
    <div className="flex flex-col gap-8">
      <div>
        <p className="text-sm text-ink-2"><Link href="/consult">Your plans</Link> / <span className="num">{job.reference}</span></p>
        <h1 className="text-3xl font-semibold">{job.title}</h1>
        <p className="mt-1 flex flex-wrap items-center gap-3 text-ink-2">
          <StatusBadge status={job.status} /> <span>prepared by {caller.shopName}</span>
        </p>
      </div>

      {plan && chosen ? (
        <>
          <section aria-label="The fit" className="flex flex-col gap-3">
            <h2 className="text-2xl font-semibold">The fit</h2>
            <FitForCustomer study={plan.study} result={plan.result} units={caller.units} chosenKitId={plan.kitId} />
          </section>
          <ConsultChoices kits={plan.result.kits} chosenKitId={plan.kitId} units={caller.units} />
          <ConsultPlan job={job} chosen={chosen} units={caller.units} />
          <ConsultPrice job={job} />
          <ConsultCautions chosen={chosen} />
          <ConsultActions job={job} checkout={checkout ?? null} zone={shopTimeZone()} />
          {readings ? (
            <section aria-label="After the cut" className="flex flex-col gap-3">
              <h2 className="text-2xl font-semibold">After the cut: readings against the plan</h2>
              <PlanVsActual verification={readings.verification} at={readings.at} />
            </section>
          ) : null}
          <Photos jobId={job.id} canEdit={false} initial={photos} />
        </>
      ) : (
        <p className="text-ink-2">The shop is still preparing this plan.</p>
      )}
    </div>
  );
}

/** The shop's own people on a customer's page: what they can do instead. */
function StaffVisit({ id }: { id: string }) {
  return (
    <div className="mx-auto flex max-w-lg flex-col gap-3 py-12">
      <h1 className="text-2xl font-semibold">This is the customer&apos;s page</h1>
      <p className="text-ink-2">The customer reads the plan and the price here and approves them. As a member of the shop you work on the same job on its own page: the plan, the quote, sharing and the readings.</p>
      <p><Link className="btn no-underline" href={`/jobs/${id}`}>Open the job</Link></p>
    </div>
  );
}
