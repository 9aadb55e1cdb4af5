import type { Metadata } from "next";
import Link from "next/link";
import { listJobs } from "@/db/jobs";
import { SHOP_STAFF } from "@/db/roles";
import { shopTimeZone } from "@/db/settings";
import { JobListQuerySchema } from "@/model/schemas/jobs";
import { EmptyState } from "../../_ui/empty-state";
import { requirePage } from "../../_ui/guard";
import { boardLink, JobPager, JobSearch, JobsTable, StatusFilter } from "./_components/job-board";

export const metadata: Metadata = { title: "Jobs" };

type Search = Promise<Record<string, string | string[] | undefined>>;

/** The jobs board: the shop's jobs by status, filtered, sorted and paged on the server. */
export default async function JobsPage({ searchParams }: { searchParams: Search }) {
  const caller = await requirePage("/jobs", SHOP_STAFF);
  const raw = Object.fromEntries(Object.entries(await searchParams).map(([k, v]) => [k, Array.isArray(v) ? v[0] : v]).filter(([, v]) => v));
  const parsed = JobListQuerySchema.safeParse(raw);
  const query = parsed.success ? parsed.data : JobListQuerySchema.parse({});
  const page = await listJobs(caller, query);
  const totalAll = Object.values(page.counts).reduce((a, b) => a + (b ?? 0), 0);
  const link = boardLink(query);
  const pages = Math.max(1, Math.ceil(page.total / page.pageSize));
  return (
    <div className="flex flex-col gap-6">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <h1 className="text-3xl font-semibold">Jobs</h1>
          <p className="text-ink-2">Customers&apos; engines on the bench, from intake to closed.</p>
        </div>
        <Link href="/jobs/new" className="btn no-underline">New job</Link>
      </div>
      <StatusFilter query={query} counts={page.counts} totalAll={totalAll} link={link} />
      <JobSearch query={query} understood={parsed.success} />
      {page.items.length === 0 ? (
        <EmptyState title={totalAll === 0 ? "No jobs yet" : "No job matches these filters"} action={totalAll === 0 ? <Link href="/jobs/new" className="btn no-underline">Open the first job</Link> : <Link href="/jobs">Clear the filters</Link>}>
          {totalAll === 0
            ? "A job is a customer's engine on the bench: intake, plan, approval, machining, verification. Open one from a study, or at intake and attach the study later."
            : "Try another status or fewer words."}
        </EmptyState>
      ) : (
        <JobsTable items={page.items} query={query} link={link} zone={shopTimeZone()} />
      )}
      {pages > 1 ? <JobPager page={query.page} total={page.total} pages={pages} link={link} /> : null}
    </div>
  );
}
