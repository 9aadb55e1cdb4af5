import Link from "next/link";
import type { JobView } from "@/db/jobs";
import { StatusBadge, money } from "../../_components/status-badge";

/** The job's title line: reference, status, for whom and its deposit, and the setup card once there is a plan. */
export function JobHeading({ job, hasPlan }: { job: JobView; hasPlan: boolean }) {
  return (
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
        {hasPlan ? (
          <>
            <Link className="btn-quiet no-underline" href={`/setup-card/${job.id}`}>Setup card</Link>
            <a className="btn-quiet no-underline" href={`/api/v1/jobs/${job.id}/setup-card.pdf`}>PDF</a>
          </>
        ) : null}
      </div>
    </div>
  );
}
