import type { JobView, quoteFor } from "@/db/jobs";
import { QuoteTable } from "../../_components/quote-table";
import { QuoteForm } from "./quote-form";

type QuoteData = Awaited<ReturnType<typeof quoteFor>>;

/** The job's quote: the form while the plan is not yet approved; afterwards the quote as approved, fixed. */
export function QuoteSection({ job, data, role, when }: { job: JobView; data: QuoteData; role: string; when: (at: string) => string }) {
  const shown = data.approved ?? data.quote;
  return (
    <section className="card flex flex-col gap-3 p-4" aria-labelledby="quote-h" data-testid="quote-section">
      <h2 id="quote-h" className="text-xl font-semibold">The quote</h2>
      {data.quote?.quote.kitStale ? (
        <p role="status" className="caution text-sm" data-testid="quote-kit-stale">
          The plan now takes {data.quote.quote.kitStale.kitName}
          {data.quote.quote.kitStale.previous ? `; the old kit line (${data.quote.quote.kitStale.previous}) was taken out of the quote` : ""}. {data.quote.quote.kitStale.reason} Until the quote is saved again the customer cannot approve it.
        </p>
      ) : null}
      {data.editable && "pricing" in data && data.pricing ? (
        <QuoteForm
          key={data.version}
          jobId={job.id}
          version={data.version}
          quote={data.quote?.quote ?? null}
          pricing={data.pricing}
          libraryKit={data.libraryKit ? { label: data.libraryKit.label, amountMinor: data.libraryKit.price.amountMinor, currency: data.libraryKit.price.currency } : null}
          role={role}
        />
      ) : shown ? (
        <>
          <QuoteTable totals={shown.totals} taxPercent={shown.quote.taxPercent} depositPercent={shown.quote.depositPercent} overridden={Boolean(shown.quote.depositOverride)} />
          <p className="text-sm text-ink-2" data-testid="quote-fixed">
            {job.approval
              ? `Approved with the plan by ${job.approval.by.name} on ${when(job.approval.at)}; fixed from then on. To change it, move the job back to planned (with a reason): the customer then approves again.`
              : "Fixed: the job is past planning."}
          </p>
        </>
      ) : (
        <p className="text-sm text-ink-2">No quote was written before the plan was approved.</p>
      )}
    </section>
  );
}
