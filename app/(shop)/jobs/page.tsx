import type { Metadata } from "next";
import { shopTimeZone } from "@/db/settings";
import { dateTimeText } from "@/model/dates";
import Link from "next/link";
import { JOB_STATUSES, STATUS_LABEL } from "@/model/job-status";
import { listJobs } from "@/db/jobs";
import { SHOP_STAFF } from "@/db/roles";
import { JobListQuerySchema } from "@/model/schemas/jobs";
import { EmptyState } from "../../_ui/empty-state";
import { requirePage } from "../../_ui/guard";
import { StatusBadge, money } from "./_components/status-badge";

export const metadata: Metadata = { title: "Jobs" };

type Search = Promise<Record<string, string | string[] | undefined>>;

const COLUMNS = [
  ["reference", "Job"],
  ["title", "Engine"],
  ["customerName", "Customer"],
  ["status", "Status"],
  ["updatedAt", "Last change"],
] as const;

/** The jobs board: the shop's jobs by status, filtered, sorted and paged on the server. */
export default async function JobsPage({ searchParams }: { searchParams: Search }) {
  const caller = await requirePage("/jobs", SHOP_STAFF);
  const zone = shopTimeZone();
  const raw = Object.fromEntries(Object.entries(await searchParams).map(([k, v]) => [k, Array.isArray(v) ? v[0] : v]).filter(([, v]) => v));
  const parsed = JobListQuerySchema.safeParse(raw);
  const query = parsed.success ? parsed.data : JobListQuerySchema.parse({});
  const page = await listJobs(caller, query);
  const totalAll = Object.values(page.counts).reduce((a, b) => a + (b ?? 0), 0);
  const link = (over: Record<string, string | number | undefined>) => {
    const p = new URLSearchParams();
    const merged = { status: query.status, q: query.q, sort: query.sort, dir: query.dir, page: query.page, ...over };
    for (const [k, v] of Object.entries(merged)) if (v !== undefined && v !== "" && !(k === "page" && v === 1)) p.set(k, String(v));
    const s = p.toString();
    return s ? `/jobs?${s}` : "/jobs";
  };
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

      <nav aria-label="Filter by status" className="flex flex-wrap gap-2">
        <Link href={link({ status: undefined, page: 1 })} className={`rounded-md border px-3 py-1 text-sm no-underline ${!query.status ? "border-accent bg-accent-soft text-accent" : "border-rule text-ink-2"}`}>
          All <span className="num">{totalAll}</span>
        </Link>
        {JOB_STATUSES.map((s) => (
          <Link key={s} href={link({ status: s, page: 1 })} className={`rounded-md border px-3 py-1 text-sm no-underline ${query.status === s ? "border-accent bg-accent-soft text-accent" : "border-rule text-ink-2"}`}>
            {STATUS_LABEL[s]} <span className="num">{page.counts[s] ?? 0}</span>
          </Link>
        ))}
      </nav>

      <form method="get" action="/jobs" className="flex flex-wrap items-end gap-3" role="search">
        {query.status ? <input type="hidden" name="status" value={query.status} /> : null}
        <div>
          <label htmlFor="jobs-q" className="field-label">Find a job</label>
          <input id="jobs-q" name="q" defaultValue={query.q ?? ""} placeholder="reference, engine, customer, engine no." className="field-input w-80" />
        </div>
        <button className="btn-quiet" type="submit">Filter</button>
        {!parsed.success ? <p className="field-error">Some filters were not understood and were ignored.</p> : null}
      </form>

      {page.items.length === 0 ? (
        <EmptyState title={totalAll === 0 ? "No jobs yet" : "No job matches these filters"} action={totalAll === 0 ? <Link href="/jobs/new" className="btn no-underline">Open the first job</Link> : <Link href="/jobs">Clear the filters</Link>}>
          {totalAll === 0
            ? "A job is a customer's engine on the bench: intake, plan, approval, machining, verification. Open one from a study, or at intake and attach the study later."
            : "Try another status or fewer words."}
        </EmptyState>
      ) : (
        <div className="card relative overflow-x-auto">
          <table className="w-full text-sm">
            <thead className="border-b border-rule text-left text-ink-2">
              <tr>
                {COLUMNS.map(([key, label]) => {
                  const active = (query.sort ?? "updatedAt") === key;
                  const dir = active ? (query.dir ?? (query.sort ? "asc" : "desc")) : undefined;
                  const next = active && dir === "asc" ? "desc" : "asc";
                  return (
                    <th key={key} className="px-3 py-2 font-medium" aria-sort={dir === "asc" ? "ascending" : dir === "desc" ? "descending" : "none"}>
                      <Link href={link({ sort: key, dir: next, page: 1 })} className="text-ink-2 no-underline hover:text-ink">
                        {label} {dir === "asc" ? "▲" : dir === "desc" ? "▼" : ""}
                      </Link>
                    </th>
                  );
                })}
                <th className="px-3 py-2 font-medium">Kit</th>
                <th className="px-3 py-2 font-medium">Deposit</th>
                <th className="px-3 py-2 font-medium">Verification</th>
              </tr>
            </thead>
            <tbody>
              {page.items.map((j) => (
                <tr key={j.id} className="border-b border-rule last:border-0">
                  <td className="px-3 py-2 num"><Link href={`/jobs/${j.id}`}>{j.reference}</Link></td>
                  <td className="px-3 py-2">{j.title}</td>
                  <td className="px-3 py-2">{j.customer.name}</td>
                  <td className="px-3 py-2"><StatusBadge status={j.status} /></td>
                  <td className="px-3 py-2 num text-ink-2">{dateTimeText(j.updatedAt, zone)}</td>
                  <td className="px-3 py-2">{j.plan?.kitName ?? <span className="text-ink-3">no plan yet</span>}</td>
                  <td className="px-3 py-2 num">{j.deposit.amount > 0 ? `${money(j.deposit.amount, j.deposit.currency)} · ${j.deposit.paid ? "paid" : "unpaid"}` : "—"}</td>
                  <td className="px-3 py-2">{j.verification ? (j.verification.verdict === "pass" ? "within the plan" : j.verification.verdict === "fail" ? "outside the plan" : "incomplete") : "—"}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
      {pages > 1 ? (
        <nav aria-label="Pages" className="flex items-center gap-3 text-sm">
          {query.page > 1 ? <Link href={link({ page: query.page - 1 })}>Previous</Link> : null}
          <span className="text-ink-2">Page <span className="num">{query.page}</span> of <span className="num">{pages}</span> · <span className="num">{page.total}</span> jobs</span>
          {query.page < pages ? <Link href={link({ page: query.page + 1 })}>Next</Link> : null}
        </nav>
      ) : null}
    </div>
  );
}
