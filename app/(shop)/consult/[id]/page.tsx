import type { Metadata } from "next";
import { lengthLabel } from "@/model/units";
import Link from "next/link";
import { notFound } from "next/navigation";
import { AccessError } from "@/db/access";
import { jobDetail } from "@/db/jobs";
import { listPhotos } from "@/db/photos";
import { SHOP_STAFF } from "@/db/roles";
import { shopTimeZone } from "@/db/settings";
import type { KitResult, WarningCode } from "@/geometry";
import { governingClearanceMm } from "@/scene/fit";
import { CONSULT_CAUTIONS } from "@/model/cautions";
import { VERDICT_TEXT } from "@/model/verdict";
import { requirePage } from "../../../_ui/guard";
import { Photos } from "../../jobs/[id]/_components/photos";
import { PlanVsActual } from "../../jobs/[id]/_components/plan-vs-actual";
import { QuoteTable } from "../../jobs/_components/quote-table";
import { StatusBadge, money } from "../../jobs/_components/status-badge";
import { ConsultActions } from "./_components/consult-actions";
import { FitForCustomer } from "./_components/fit";
import { VerdictMark } from "@/app/_ui/studio/verdict-mark";

export const metadata: Metadata = { title: "Your plan" };

/** The core's warnings a customer decides on; the rest (the rig, the holder, the readings) are the bench's to act on. */
const FOR_THE_CUSTOMER: ReadonlySet<WarningCode> = new Set<WarningCode>(["stud-pattern-mismatch", "crank-chamber-not-checked", "crank-clearance-below-minimum", "matched-passage-wall-below-minimum"]);

/** The product's one set of verdict words (model/verdict.ts), each with what it means for the customer. */
const VERDICT_WORDS: Record<KitResult["verdict"], string> = {
  "fits-as-is": `${VERDICT_TEXT["fits-as-is"].words} — no cutting needed.`,
  "fits-after-cut": `${VERDICT_TEXT["fits-after-cut"].words} — once the case mouth is cut to size.`,
  "cannot-fit": `${VERDICT_TEXT["cannot-fit"].words} — not on this case.`,
};

/** The consult page: what the customer sees of the shop — the fit, the choices in plain words, the plan, the cautions, approve, ask, pay. */
export default async function ConsultJobPage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<{ checkout?: string }> }) {
  const { id } = await params;
  const { checkout } = await searchParams;
  const caller = await requirePage(`/consult/${id}`);
  if (SHOP_STAFF.includes(caller.role)) return <StaffVisit id={id} />;
  const detail = await jobDetail(caller, id).catch((error: unknown) => {
    if (error instanceof AccessError && error.code === "not_found") notFound();
    throw error;
  });
  const { job, plan, readings } = detail;
  const photos = await listPhotos(caller, id).catch((error: unknown) => {
    // The photos are an aside of the consult page: without the object store the rest of the job still shows.
    console.warn("consult page: the job's photos could not be listed; the page shows without them.", error);
    return null;
  });
  const L = (mm: number) => lengthLabel(mm, caller.units);
  const chosen = plan?.result.kits.find((k) => k.kitId === plan.kitId);
  const zone = shopTimeZone();
  // The quote the customer decides on: the one approved with the plan once approved, else the shop's current one.
  const quote = job.approvedQuote ?? job.quote;
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

          <section aria-label="The choices" className="flex flex-col gap-3">
            <h2 className="text-2xl font-semibold">The kits we compared, in plain words</h2>
            <ul className="grid gap-3 md:grid-cols-2">
              {plan.result.kits.map((k) => (
                <li key={k.kitId} className={`card p-4 text-lg ${k.kitId === plan.kitId ? "border-2 border-accent" : ""}`}>
                  <p className="font-semibold">{k.name}{k.kitId === plan.kitId ? " — the shop's choice" : ""}</p>
                  <p>Displacement <span className="num">{k.displacementCc.stockRounded} cc → {k.displacementCc.kitRounded} cc</span>.</p>
                  <p>{k.cut ? <>The case mouth must be cut to <span className="num">{L(k.cut.diameterMm)}</span> across, <span className="num">{L(k.cut.depthMm)}</span> deep.</> : "No cutting needed."}</p>
                  <p>
                    Risk: <VerdictMark verdict={k.verdict} words={VERDICT_WORDS[k.verdict]} />
                    {k.thinnestWall && k.verdict !== "cannot-fit" ? <> The thinnest wall left is <span className="num">{L(k.thinnestWall.minWallMm)}</span>.</> : null}
                  </p>
                </li>
              ))}
            </ul>
          </section>

          <section aria-label="The plan" className="card flex flex-col gap-2 p-5 text-lg">
            <h2 className="text-2xl font-semibold">The plan</h2>
            <p>Kit: <strong>{chosen.name}</strong>.</p>
            {chosen.cut ? (
              <p>
                The shop will widen the crankcase mouth to <strong className="num">{L(chosen.cut.diameterMm)}</strong> and <strong className="num">{L(chosen.cut.depthMm)}</strong> deep, leaving{" "}
                <span className="num" data-testid="consult-room">{L(governingClearanceMm(chosen))}</span> of room around the cylinder skirt.
              </p>
            ) : (
              <p>The cylinder goes in without cutting the case.</p>
            )}
            <p>Machining deposit: <strong className="num">{job.deposit.amount > 0 ? money(job.deposit.amount, job.deposit.currency) : "none"}</strong>{job.deposit.amount > 0 ? <span data-testid="paid-state"> — {job.deposit.paid ? "paid, thank you" : "not paid yet"}</span> : null}.</p>
          </section>

          <section aria-labelledby="consult-quote-h" className="card flex flex-col gap-2 p-5">
            <h2 id="consult-quote-h" className="text-2xl font-semibold">The price</h2>
            {quote ? (
              <>
                <p className="text-lg">What the shop charges for this plan, line by line. You approve the plan and this price together{job.approvedQuote ? "; both are approved." : "."}</p>
                {quote.quote.kitStale ? <p className="caution text-lg" data-testid="quote-pending">The shop is pricing the kit for this plan ({quote.quote.kitStale.kitName}); the price below is not complete yet, and you can approve once the shop has written it.</p> : null}
                <QuoteTable large totals={quote.totals} taxPercent={quote.quote.taxPercent} depositPercent={quote.quote.depositPercent} overridden={Boolean(quote.quote.depositOverride)} />
              </>
            ) : (
              <p className="text-lg" data-testid="no-quote">The shop has not written the price yet. Ask below if you want it before you approve.</p>
            )}
          </section>

          <section aria-label="Cautions" className="caution flex flex-col gap-1 text-base" data-testid="consult-cautions">
            <h2 className="text-xl font-semibold">Before you decide</h2>
            <p>{CONSULT_CAUTIONS.legalClass}{chosen.displacementCc.crossesClasses.length ? ` This kit crosses the ${chosen.displacementCc.crossesClasses.join(", ")} cc line.` : ""}</p>
            <p>{CONSULT_CAUTIONS.kitMaker}</p>
            {chosen.warnings.filter((w) => FOR_THE_CUSTOMER.has(w.code)).map((w) => <p key={w.code + w.message}>{w.message}</p>)}
          </section>

          <ConsultActions job={job} checkout={checkout ?? null} zone={zone} />

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
