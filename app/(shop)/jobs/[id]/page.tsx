import type { Metadata } from "next";
import { lengthLabel } from "@/model/units";
import { shopTimeZone } from "@/db/settings";
import { dateText, dateTimeText } from "@/model/dates";
import { depthStopSentence } from "@/model/depth-stop-words";
import { TERM } from "@/model/glossary";
import Link from "next/link";
import { notFound } from "next/navigation";
import { AccessError } from "@/db/access";
import { jobDetail, quoteFor } from "@/db/jobs";
import { listPhotos } from "@/db/photos";
import { SHOP_STAFF } from "@/db/roles";
import { requirePage } from "../../../_ui/guard";
import { PlanVerdict } from "../_components/plan-verdict";
import { StatusBadge, money } from "../_components/status-badge";
import { JobActions } from "./_components/job-actions";
import { Photos } from "./_components/photos";
import { PlanVsActual } from "./_components/plan-vs-actual";
import { ReadingsForm } from "./_components/readings-form";
import { QuoteSection } from "./_components/quote-section";
import { VerifyDecision } from "./_components/verify-decision";

export const metadata: Metadata = { title: "Job" };

/** One job: its status and moves, the plan against what was cut, the readings form, photos and history. */
export default async function JobPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const caller = await requirePage(`/jobs/${id}`, SHOP_STAFF);
  const detail = await jobDetail(caller, id).catch((error: unknown) => {
    if (error instanceof AccessError && error.code === "not_found") notFound();
    throw error;
  });
  const { job, plan, readings } = detail;
  const photos = await listPhotos(caller, id).catch((error: unknown) => {
    // The photos are an aside of the job page: without the object store the rest of the job still shows.
    console.warn("job page: the job's photos could not be listed; the page shows without them.", error);
    return null;
  });
  const quote = await quoteFor(caller, id);
  const kit = plan ? plan.result.kits.find((k) => k.kitId === plan.kitId) : undefined;
  const L = (mm: number) => lengthLabel(mm, caller.units);
  const zone = shopTimeZone();
  const when = (at: string) => dateTimeText(at, zone);
  return (
    <div className="flex flex-col gap-6">
      <div className="flex flex-wrap items-start justify-between gap-4">
        <div>
          <p className="text-sm text-ink-2"><Link href="/jobs">Jobs</Link> / <span className="num">{job.reference}</span></p>
          <h1 className="text-3xl font-semibold break-words">{job.title}</h1>
          <p className="mt-1 flex flex-wrap items-center gap-3 text-ink-2">
            <StatusBadge status={job.status} />
            {job.ownEngine ? (
              <span>the shop&apos;s own engine</span>
            ) : (
              <>
                <span className="break-all">for {job.customer.name} ({job.customer.email})</span>
                <span data-testid="deposit-state">
                  {job.deposit.amount > 0 ? `Deposit ${money(job.deposit.amount, job.deposit.currency)}: ${job.deposit.paid ? "paid" : "unpaid"}` : "No deposit asked"}
                </span>
              </>
            )}
            {job.sharedAt ? <span>· shared with the customer</span> : null}
          </p>
        </div>
        <div className="flex gap-2">
          {plan ? (
            <>
              <Link className="btn-quiet no-underline" href={`/setup-card/${job.id}`}>Setup card</Link>
              <a className="btn-quiet no-underline" href={`/api/v1/jobs/${job.id}/setup-card.pdf`}>PDF</a>
            </>
          ) : null}
        </div>
      </div>

      {kit ? <PlanVerdict kit={kit} job={job} /> : null}

      <JobActions job={job} role={caller.role} hasPlan={plan !== null} />

      <section className="grid gap-4 md:grid-cols-3">
        <div className="card p-4">
          <h2 className="mb-2 font-semibold">The engine</h2>
          <dl className="grid grid-cols-2 gap-y-1 text-sm">
            <dt className="text-ink-2">Engine no.</dt><dd className="num">{job.engineNumber || "—"}</dd>
            <dt className="text-ink-2">Case no.</dt><dd className="num">{job.caseNumber || "—"}</dd>
            <dt className="text-ink-2">Case variant</dt><dd>{job.caseVariant || (plan?.study.case.name ?? "—")}</dd>
          </dl>
        </div>
        <div className="card p-4 md:col-span-2">
          <h2 className="mb-2 font-semibold">The plan</h2>
          {plan && kit ? (
            <dl className="grid grid-cols-2 gap-y-1 text-sm sm:grid-cols-4">
              <dt className="text-ink-2">Kit</dt><dd className="sm:col-span-3">{kit.name} <span className="text-ink-3">(study “{plan.studyName}”{job.studyId ? <> · <Link href={`/studies/${job.studyId}`}>open</Link></> : null})</span></dd>
              <dt className="text-ink-2">Cut</dt><dd className="num sm:col-span-3">{kit.cut ? `⌀ ${L(kit.cut.diameterMm)} × ${L(kit.cut.depthMm)} deep` : "no cut needed"}</dd>
              <dt className="text-ink-2">{TERM.cutterSetting.short}</dt><dd className="num">{kit.rig ? L(kit.rig.cutterSettingToSetMm ?? kit.rig.cutterSettingMm) : "—"}</dd>
              <dt className="text-ink-2">{TERM.depthStop.label}</dt><dd>{kit.rig ? depthStopSentence(kit.rig.depthStop, caller.units) : "—"}</dd>
              <dt className="text-ink-2">Displacement</dt><dd className="num">{kit.displacementCc.stockRounded} → {kit.displacementCc.kitRounded} cc</dd>
              <dt className="text-ink-2">Taken</dt><dd className="num">{when(plan.takenAt)}</dd>
            </dl>
          ) : (
            <p className="text-ink-2">No plan yet. Attach a study from the <Link href="/studies">studies</Link>; the job is then planned with its chosen kit.</p>
          )}
        </div>
      </section>

      <QuoteSection job={job} data={quote} role={caller.role} when={when} />

      {job.approval ? (
        <p className="text-sm text-ink-2" data-testid="approval">
          Approved by {job.approval.by.name} on {when(job.approval.at)}{job.approval.reason ? ` — ${job.approval.reason}` : ""}.
        </p>
      ) : null}

      <section className="flex flex-col gap-3">
        <h2 className="text-xl font-semibold">Plan against actual</h2>
        {readings ? <PlanVsActual verification={readings.verification} at={readings.at} /> : <p className="text-ink-2">No after-cut readings yet.</p>}
        {job.verification?.override ? (
          <p className="rounded-md border-l-4 border-error bg-paper-2 px-4 py-2 text-sm" data-testid="verify-override">
            Verified although the readings are outside the plan, on {job.verification.override.by.name}&apos;s override ({dateText(job.verification.override.at, zone)}): {job.verification.override.reason}
          </p>
        ) : null}
        {job.status === "machined" && job.verification?.verdict === "fail" ? <VerifyDecision jobId={job.id} role={caller.role} /> : null}
        {job.status === "machined" && plan ? (
          <ReadingsForm jobId={job.id} studs={plan.study.case.studs.map((s) => s.label)} previous={readings?.readings ?? null} />
        ) : job.status === "approved" || job.status === "planned" || job.status === "intake" ? (
          <p className="text-sm text-ink-3">The readings form opens once the job is machined.</p>
        ) : null}
      </section>

      <Photos jobId={job.id} canEdit initial={photos} />

      <section className="grid gap-6 md:grid-cols-2">
        <div>
          <h2 className="mb-2 text-xl font-semibold">History</h2>
          <ol className="flex flex-col gap-1 text-sm" data-testid="history">
            {detail.history.map((h, i) => (
              <li key={i} className="border-b border-rule py-1">
                <span className="num text-ink-3">{when(h.at)}</span> · <strong>{h.by.name}</strong> {h.summary}
              </li>
            ))}
          </ol>
        </div>
        <div>
          <h2 className="mb-2 text-xl font-semibold">Questions from the customer</h2>
          {detail.questions.length === 0 ? (
            <p className="text-sm text-ink-2">None yet. The customer can ask from the consult page; questions arrive here and by e-mail.</p>
          ) : (
            <ul className="flex flex-col gap-2 text-sm">
              {detail.questions.map((q) => (
                <li key={q.id} className="card p-3"><span className="text-ink-3 num">{when(q.at)}</span> · <strong>{q.by.name}</strong>: {q.text}</li>
              ))}
            </ul>
          )}
        </div>
      </section>
    </div>
  );
}
