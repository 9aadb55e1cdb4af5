import type { JobView } from "@/db/jobs";
import type { KitResult, LengthUnits, WarningCode } from "@/geometry";
import { CONSULT_CAUTIONS } from "@/model/cautions";
import { lengthLabel } from "@/model/units";
import { governingClearanceMm } from "@/scene/fit";
import { QuoteTable } from "../../../jobs/_components/quote-table";
import { money } from "../../../jobs/_components/status-badge";

/** The core's warnings a customer decides on; the rest (the rig, the holder, the readings) are the bench's to act on. */
const FOR_THE_CUSTOMER: ReadonlySet<WarningCode> = new Set<WarningCode>(["stud-pattern-mismatch", "crank-chamber-not-checked", "crank-clearance-below-minimum", "matched-passage-wall-below-minimum"]);

/** The chosen kit and its cut in plain words, with the machining deposit. */
export function ConsultPlan({ job, chosen, units }: { job: JobView; chosen: KitResult; units: LengthUnits }) {
  const L = (mm: number) => lengthLabel(mm, units);
  return (
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
  );
}

/** The price the customer decides on: the one approved with the plan once approved, else the shop's current one. */
export function ConsultPrice({ job }: { job: JobView }) {
  const quote = job.approvedQuote ?? job.quote;
  return (
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
  );
}

/** The cautions in place before the customer decides: the legal class, the kit maker's word, the warnings that are theirs to weigh. */
export function ConsultCautions({ chosen }: { chosen: KitResult }) {
  return (
    <section aria-label="Cautions" className="caution flex flex-col gap-1 text-base" data-testid="consult-cautions">
      <h2 className="text-xl font-semibold">Before you decide</h2>
      <p>{CONSULT_CAUTIONS.legalClass}{chosen.displacementCc.crossesClasses.length ? ` This kit crosses the ${chosen.displacementCc.crossesClasses.join(", ")} cc line.` : ""}</p>
      <p>{CONSULT_CAUTIONS.kitMaker}</p>
      {chosen.warnings.filter((w) => FOR_THE_CUSTOMER.has(w.code)).map((w) => <p key={w.code + w.message}>{w.message}</p>)}
    </section>
  );
}
