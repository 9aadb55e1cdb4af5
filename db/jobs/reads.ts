import "server-only";
import { and, asc, count, desc, eq, isNotNull, isNull, like, or, sql, type SQL } from "drizzle-orm";
import type { JobStatus } from "@/model/job-status";
import type { JobListQuery } from "@/model/schemas/jobs";
import type { Caller } from "../access";
import { getDb } from "../client";
import * as schema from "../schema";
import * as jobs from "../schema-jobs";
import { iso, isStaff, j, latestReadings, loadFor, parsePlan, view, type JobView } from "./view";

// Reading jobs: the shop's list with counts by status, one job, and everything a job's page shows.

function customerFilter(caller: Caller): SQL | undefined {
  return and(
    isNotNull(j.sharedAt),
    eq(j.ownEngine, false),
    or(eq(j.customerUserId, caller.userId), and(isNull(j.customerUserId), sql`lower(${j.customerEmail}) = ${caller.email.toLowerCase()}`)),
  );
}

function sortColumn(sort: JobListQuery["sort"]) {
  switch (sort) {
    case "reference":
      return j.reference;
    case "title":
      return sql`lower(${j.title})`;
    case "customerName":
      return sql`lower(${j.customerName})`;
    case "status":
      return sql`case ${j.status} when 'intake' then 0 when 'planned' then 1 when 'approved' then 2 when 'machined' then 3 when 'verified' then 4 else 5 end`;
    case "createdAt":
      return j.createdAt;
    default:
      return j.updatedAt;
  }
}

/** One page of jobs: all of the shop's for staff, only the caller's own shared jobs for a customer; with counts by status. */
export async function listJobs(caller: Caller, query: JobListQuery) {
  const db = await getDb();
  const scope = and(eq(j.organizationId, caller.shopId), isStaff(caller) ? undefined : customerFilter(caller));
  const q = query.q ? `%${query.q.toLowerCase().replace(/[%_]/g, (m) => `\\${m}`)}%` : undefined;
  const text = q
    ? or(like(sql`lower(${j.title})`, q), like(sql`lower(${j.customerName})`, q), like(sql`lower(${j.reference})`, q), like(sql`lower(${j.engineNumber})`, q))
    : undefined;
  const where = and(scope, text, query.status ? eq(j.status, query.status) : undefined);
  const dir = query.dir ?? (query.sort ? "asc" : "desc");
  const column = sortColumn(query.sort);
  const [total] = await db.select({ n: count() }).from(j).where(where);
  const byStatus = await db.select({ status: j.status, n: count() }).from(j).where(and(scope, text)).groupBy(j.status);
  const rows = await db
    .select({ record: j, creatorName: schema.user.name })
    .from(j)
    .innerJoin(schema.user, eq(schema.user.id, j.createdBy))
    .where(where)
    .orderBy(dir === "asc" ? asc(column) : desc(column), asc(j.id))
    .limit(query.pageSize)
    .offset((query.page - 1) * query.pageSize);
  const latest = await latestReadings(rows.map((r) => r.record.id));
  return {
    items: rows.map((r) => view(caller, { ...r, latest: latest.get(r.record.id) ?? null })),
    page: query.page,
    pageSize: query.pageSize,
    total: total?.n ?? 0,
    counts: Object.fromEntries(byStatus.map((s) => [s.status, s.n])) as Partial<Record<JobStatus, number>>,
  };
}

export async function getJob(caller: Caller, id: string): Promise<JobView> {
  return view(caller, await loadFor(caller, id));
}

/** The jobs of the shop opened from one study, newest first (for the study's page). */
export async function jobsForStudy(caller: Caller, studyId: string): Promise<{ id: string; reference: string; title: string; status: JobStatus; hasPlan: boolean }[]> {
  if (!isStaff(caller)) return [];
  const db = await getDb();
  const rows = await db
    .select({ id: j.id, reference: j.reference, title: j.title, status: j.status, planJson: j.planJson })
    .from(j)
    .where(and(eq(j.organizationId, caller.shopId), eq(j.studyId, studyId)))
    .orderBy(desc(j.createdAt))
    .limit(20);
  return rows.map((r) => ({ id: r.id, reference: r.reference, title: r.title, status: r.status as JobStatus, hasPlan: r.planJson !== null }));
}

/** Everything the job page and the consult page show: the job, its plan, latest readings and verification, history, questions. */
export async function jobDetail(caller: Caller, id: string) {
  const loaded = await loadFor(caller, id);
  const db = await getDb();
  const plan = parsePlan(loaded.record);
  const latest = loaded.latest;
  const events = await db.select().from(jobs.jobEvent).where(eq(jobs.jobEvent.jobId, id)).orderBy(desc(jobs.jobEvent.at), desc(jobs.jobEvent.id));
  const questions = await db.select().from(jobs.jobQuestion).where(eq(jobs.jobQuestion.jobId, id)).orderBy(asc(jobs.jobQuestion.at));
  const asCustomer = caller.role === "customer";
  return {
    job: view(caller, loaded),
    plan,
    readings: latest ? { readings: latest.readings, verification: latest.verification, at: iso(latest.takenAt) ?? "" } : null,
    history: events
      .filter((e) => !asCustomer || e.kind !== "note")
      .map((e) => ({ at: iso(e.at) ?? "", by: { id: e.byId ?? "", name: e.byName }, kind: e.kind, from: e.fromStatus, to: e.toStatus, summary: e.summary })),
    questions: questions.map((q) => ({ id: q.id, at: iso(q.at) ?? "", by: { id: q.byId, name: q.byName }, text: q.text })),
  };
}
export type JobDetail = Awaited<ReturnType<typeof jobDetail>>;
