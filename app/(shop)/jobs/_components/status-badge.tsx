import { STATUS_LABEL, type JobStatus } from "@/model/job-status";
import type { CurrencyCode } from "@/model/money";
import { formatMoney } from "@/model/money-text";
import { STATUS_ICON } from "@/model/palette";

// Status badges are neutral (no colour of the fit code): a glyph that fills as the job moves on tells them apart.
const TONE: Record<JobStatus, string> = {
  intake: "border-rule bg-card text-ink-2",
  planned: "border-rule bg-paper-2 text-ink",
  approved: "border-rule bg-paper-2 text-ink",
  machined: "border-ink-3 bg-paper-2 text-ink",
  verified: "border-ink-2 bg-accent-soft text-ink",
  closed: "border-rule bg-paper-2 text-ink-2",
};

/** A job's status as a small label (the word always shown; the glyph and shade only help). */
export function StatusBadge({ status }: { status: JobStatus }) {
  return (
    <span className={`inline-flex items-center gap-1 rounded border px-2 py-0.5 text-xs font-medium ${TONE[status]}`}>
      <span aria-hidden>{STATUS_ICON[status]}</span>
      <span data-testid="job-status">{STATUS_LABEL[status]}</span>
    </span>
  );
}

/** An amount in the currency's minor units with its code (as a job's deposit stores them), as money text. */
export function money(amount: number, currency: string): string {
  return formatMoney({ amountMinor: amount, currency: currency.toUpperCase() as CurrencyCode });
}
