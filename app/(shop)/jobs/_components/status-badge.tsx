import { STATUS_LABEL, type JobStatus } from "@/model/job-status";

const TONE: Record<JobStatus, string> = {
  intake: "bg-paper-2 text-ink-2",
  planned: "bg-accent-soft text-accent",
  approved: "bg-accent-soft text-accent",
  machined: "bg-tight-soft text-ink",
  verified: "bg-clear-soft text-clear",
  closed: "bg-paper-2 text-ink-3",
};

/** A job's status as a small label (the word always shown, the colour only helps). */
export function StatusBadge({ status }: { status: JobStatus }) {
  return <span className={`inline-block rounded px-2 py-0.5 text-xs font-medium ${TONE[status]}`} data-testid="job-status">{STATUS_LABEL[status]}</span>;
}

/** An amount in the smallest currency unit, as money. */
export function money(amount: number, currency: string): string {
  return `${(amount / 100).toFixed(2)} ${currency.toUpperCase()}`;
}
