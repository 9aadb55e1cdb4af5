import Link from "next/link";
import type { listJobs } from "@/db/jobs";
import { dateTimeText } from "@/model/dates";
import { JOB_STATUSES, STATUS_LABEL } from "@/model/job-status";
import type { JobListQuery } from "@/model/schemas/jobs";
import { StatusBadge, money } from "./status-badge";

// The parts of the jobs board. Everything is a link or a GET form, so the board works without script and
// every view of it has its own address.

export type JobPage = Awaited<ReturnType<typeof listJobs>>;
/** The board's address with some of its query changed (page 1 and empty values left out). */
export type BoardLink = (over: Record<string, string | number | undefined>) => string;

export function boardLink(query: JobListQuery): BoardLink {
  return (over) => {
    const p = new URLSearchParams();
    const merged = { status: query.status, q: query.q, sort: query.sort, dir: query.dir, page: query.page, ...over };
    for (const [k, v] of Object.entries(merged)) if (v !== undefined && v !== "" && !(k === "page" && v === 1)) p.set(k, String(v));
    const s = p.toString();
    return s ? `/jobs?${s}` : "/jobs";
  };
}

const pill = (on: boolean) => `rounded-md border px-3 py-1 text-sm no-underline ${on ? "border-accent bg-accent-soft text-accent" : "border-rule text-ink-2"}`;

/** One link per status with its count, and "All". */
export function StatusFilter({ query, counts, totalAll, link }: { query: JobListQuery; counts: JobPage["counts"]; totalAll: number; link: BoardLink }) {
  return (
    <nav aria-label="Filter by status" className="flex flex-wrap gap-2">
      <Link href={link({ status: undefined, page: 1 })} className={pill(!query.status)}>
        All <span className="num">{totalAll}</span>
      </Link>
      {JOB_STATUSES.map((s) => (
        <Link key={s} href={link({ status: s, page: 1 })} className={pill(query.status === s)}>
          {STATUS_LABEL[s]} <span className="num">{counts[s] ?? 0}</span>
        </Link>
      ))}
    </nav>
  );
}

export function JobSearch({ query, understood }: { query: JobListQuery; understood: boolean }) {
  return (
    <form method="get" action="/jobs" className="flex flex-wrap items-end gap-3" role="search">
      {query.status ? <input type="hidden" name="status" value={query.status} /> : null}
      <div>
        <label htmlFor="jobs-q" className="field-label">Find a job</label>
        <input id="jobs-q" name="q" defaultValue={query.q ?? ""} placeholder="reference, engine, customer, engine no." className="field-input w-80" />
      </div>
      <button className="btn-quiet" type="submit">Filter</button>
      {!understood ? <p className="field-error">Some filters were not understood and were ignored.</p> : null}
    </form>
  );
}

const COLUMNS = [
  ["reference", "Job"],
  ["title", "Engine"],
  ["customerName", "Customer"],
  ["status", "Status"],
  ["updatedAt", "Last change"],
] as const;
/** The columns after the sortable ones: the board does not sort by them. */
const PLAIN_COLUMNS = ["Kit", "Deposit", "Verification"] as const;

const VERIFICATION_WORDS: Record<string, string> = { pass: "within the plan", fail: "outside the plan" };

/** The jobs of this page, each sortable column a link that sorts the board by it. */
export function JobsTable({ items, query, link, zone }: { items: JobPage["items"]; query: JobListQuery; link: BoardLink; zone: string }) {
  return (
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
            {PLAIN_COLUMNS.map((label) => (
              <th key={label} className="px-3 py-2 font-medium">
                {label}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {items.map((j) => (
            <tr key={j.id} className="border-b border-rule last:border-0">
              <td className="px-3 py-2 num"><Link href={`/jobs/${j.id}`}>{j.reference}</Link></td>
              <td className="px-3 py-2">{j.title}</td>
              <td className="px-3 py-2">{j.customer.name}</td>
              <td className="px-3 py-2"><StatusBadge status={j.status} /></td>
              <td className="px-3 py-2 num text-ink-2">{dateTimeText(j.updatedAt, zone)}</td>
              <td className="px-3 py-2">{j.plan?.kitName ?? <span className="text-ink-3">no plan yet</span>}</td>
              <td className="px-3 py-2 num">{j.deposit.amount > 0 ? `${money(j.deposit.amount, j.deposit.currency)} · ${j.deposit.paid ? "paid" : "unpaid"}` : "—"}</td>
              <td className="px-3 py-2">{j.verification ? (VERIFICATION_WORDS[j.verification.verdict] ?? "incomplete") : "—"}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

export function JobPager({ page, total, pages, link }: { page: number; total: number; pages: number; link: BoardLink }) {
  return (
    <nav aria-label="Pages" className="flex items-center gap-3 text-sm">
      {page > 1 ? <Link href={link({ page: page - 1 })}>Previous</Link> : null}
      <span className="text-ink-2">Page <span className="num">{page}</span> of <span className="num">{pages}</span> · <span className="num">{total}</span> jobs</span>
      {page < pages ? <Link href={link({ page: page + 1 })}>Next</Link> : null}
    </nav>
  );
}
