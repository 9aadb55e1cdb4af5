import "server-only";
import { and, desc, eq, inArray } from "drizzle-orm";
import { z } from "zod";
import { StudyResultSchema, StudySchema, type Verdict } from "@/geometry";
import { AfterCutReadingsSchema } from "@/model/schemas/jobs";
import { decideMove, isJobStatus, movesFrom, moveNeedsReason, STATUS_LABEL, type JobStatus, type MoveFacts } from "@/model/job-status";
import { AccessError, type Caller } from "../access";
import { getDb } from "../client";
import { SHOP_STAFF } from "../roles";
import * as schema from "../schema";
import * as jobs from "../schema-jobs";
import type { AfterCutReadings, CheckKey, Verification } from "../verification";
import { quoteView, type QuoteView } from "./quote-view";

// A job as the pages and the API see it, and the one way a job is loaded for a caller: staff of its shop,
// or its own customer once it is shared. Another shop's job, or a job not shared with this customer, is a
// plain 404.

export const j = jobs.job;

/** The plan as it was when the job was planned: the assembled Study and the core's result for it. */
const PlanSnapshotSchema = z.object({
  studyId: z.string(),
  studyName: z.string(),
  kitId: z.string(),
  kitName: z.string(),
  study: StudySchema,
  result: StudyResultSchema,
  takenAt: z.string(),
});
export type PlanSnapshot = z.infer<typeof PlanSnapshotSchema>;

const CHECK_KEYS = ["cut-diameter", "cut-depth", "radial-clearance", "depth-clearance", "sealing-land", "chips", "trial-fit"] as const satisfies readonly CheckKey[];
/** A stored comparison of plan and actual, as db/verification.ts words it. */
const VerificationSchema: z.ZodType<Verification> = z.object({
  verdict: z.enum(["pass", "fail", "incomplete"]),
  toleranceMm: z.number(),
  checks: z.array(
    z.object({
      key: z.enum(CHECK_KEYS),
      label: z.string(),
      planned: z.string(),
      actual: z.string(),
      plannedMm: z.number().nullable(),
      actualMm: z.number().nullable(),
      state: z.enum(["ok", "fail", "missing"]),
      byMm: z.number().nullable(),
      message: z.string(),
    }),
  ),
});

export type Person = { id: string; name: string };

/** An owner's recorded decision to go on against what the product says (a cannot-fit plan, readings outside the plan). */
export type Override = { at: string; by: Person; reason: string };

export type JobView = {
  id: string;
  reference: string;
  title: string;
  status: JobStatus;
  statusLabel: string;
  /** The shop's own engine: no customer to share the plan with. */
  ownEngine: boolean;
  customer: { name: string; email: string; userId: string | null };
  engineNumber: string;
  caseNumber: string;
  caseVariant: string;
  studyId: string | null;
  kitId: string | null;
  plan: { studyName: string; kitName: string; takenAt: string; verdict: Verdict | null; override: Override | null } | null;
  deposit: { amount: number; currency: string; paid: boolean; paidAt: string | null };
  /** The shop's quote (null until one is written) and the quote as approved with the plan (null until approved). */
  quote: QuoteView | null;
  approvedQuote: QuoteView | null;
  sharedAt: string | null;
  approval: { at: string; by: Person; reason: string | null } | null;
  verification: { verdict: Verification["verdict"]; at: string; override: Override | null } | null;
  verifyToleranceMm: number;
  notes: string;
  version: number;
  createdAt: string;
  updatedAt: string;
  createdBy: Person;
  /** The statuses this caller may try to move the job to (the server still decides). */
  moves: JobStatus[];
  /** Of those, the moves that will ask this caller for a reason. */
  movesNeedingReason: JobStatus[];
};

export const iso = (d: Date | number | null | undefined) => (d === null || d === undefined ? null : new Date(d).toISOString());
export const isStaff = (c: Caller) => SHOP_STAFF.includes(c.role);

export function notFound(): AccessError {
  return new AccessError("not_found", "No job with this id in your shop.");
}

export function assertStaff(caller: Caller) {
  if (!isStaff(caller)) throw new AccessError("forbidden", "Your role in this shop does not allow this.");
}

/** Whether the caller is this job's own customer (by account, or by the address the job was opened with). */
export function isJobCustomer(caller: Caller, r: jobs.JobRecord): boolean {
  if (caller.role !== "customer" || r.organizationId !== caller.shopId || r.ownEngine) return false;
  if (r.customerUserId) return r.customerUserId === caller.userId;
  return r.customerEmail.toLowerCase() === caller.email.toLowerCase();
}

export function parsePlan(r: jobs.JobRecord): PlanSnapshot | null {
  if (!r.planJson) return null;
  try {
    return PlanSnapshotSchema.parse(JSON.parse(r.planJson));
  } catch (error) {
    // A plan that no longer parses or no longer matches the plan schema is shown as no plan; the job can be planned again.
    console.warn(`job ${r.id}: its stored plan does not parse; the job shows as not planned.`, error);
    return null;
  }
}

/** The study's verdict for the plan's kit, as the core gave it when the plan was taken. */
export function planVerdict(plan: PlanSnapshot | null): Verdict | null {
  return plan?.result.kits.find((k) => k.kitId === plan.kitId)?.verdict ?? null;
}

type Latest = { verdict: string; takenAt: Date; readings: AfterCutReadings; verification: Verification };
export type Loaded = { record: jobs.JobRecord; creatorName: string; latest: Latest | null };

/** The latest after-cut readings of each job. */
export async function latestReadings(jobIds: string[]): Promise<Map<string, Latest>> {
  const out = new Map<string, Latest>();
  if (jobIds.length === 0) return out;
  const db = await getDb();
  const rows = await db.select().from(jobs.jobReading).where(inArray(jobs.jobReading.jobId, jobIds)).orderBy(desc(jobs.jobReading.takenAt));
  for (const r of rows) {
    if (out.has(r.jobId)) continue;
    out.set(r.jobId, {
      verdict: r.verdict,
      takenAt: r.takenAt,
      readings: AfterCutReadingsSchema.parse(JSON.parse(r.readingsJson)),
      verification: VerificationSchema.parse(JSON.parse(r.verificationJson)),
    });
  }
  return out;
}

/** What the status machine needs to know about this job. */
export function moveFacts(r: jobs.JobRecord, latest: Latest | null): MoveFacts {
  return {
    hasPlan: r.planJson !== null,
    verification: (latest?.verdict as Verification["verdict"] | undefined) ?? null,
    planVerdict: planVerdict(parsePlan(r)),
    planOverridden: r.planOverrideAt !== null,
    ownEngine: r.ownEngine,
  };
}

function override(at: Date | null, id: string | null, name: string | null, reason: string | null): Override | null {
  return at && reason ? { at: iso(at) ?? "", by: { id: id ?? "", name: name ?? "" }, reason } : null;
}

export function view(caller: Caller, l: Loaded): JobView {
  const r = l.record;
  const plan = parsePlan(r);
  const status = isJobStatus(r.status) ? r.status : "intake";
  const asCustomer = caller.role === "customer";
  const actor = { role: caller.role, isJobCustomer: isJobCustomer(caller, r) };
  const facts = moveFacts(r, l.latest);
  // The moves this caller could make once the job is ready for them (the reason and the facts are the server's to check).
  const moves = movesFrom(status).filter((to) => decideMove({ from: status, to, actor, reason: "x", facts: { ...facts, hasPlan: true, verification: facts.verification === "fail" ? "fail" : "pass" } }).ok);
  return {
    id: r.id,
    reference: r.reference,
    title: r.title,
    status,
    statusLabel: STATUS_LABEL[status],
    ownEngine: r.ownEngine,
    customer: { name: r.customerName, email: r.customerEmail, userId: r.customerUserId },
    engineNumber: r.engineNumber,
    caseNumber: r.caseNumber,
    caseVariant: r.caseVariant,
    studyId: asCustomer ? null : r.studyId,
    kitId: r.kitId,
    plan: plan
      ? {
          studyName: plan.studyName,
          kitName: plan.kitName,
          takenAt: plan.takenAt,
          verdict: planVerdict(plan),
          override: override(r.planOverrideAt, r.planOverrideById, r.planOverrideByName, r.planOverrideReason),
        }
      : null,
    deposit: { amount: r.depositAmount, currency: r.currency, paid: r.paidAt !== null, paidAt: iso(r.paidAt) },
    quote: quoteView(caller, r.quoteJson),
    approvedQuote: quoteView(caller, r.approvedQuoteJson),
    sharedAt: iso(r.sharedAt),
    approval: r.approvedAt ? { at: iso(r.approvedAt) ?? "", by: { id: r.approvedById ?? "", name: r.approvedByName ?? "" }, reason: r.approvalReason } : null,
    verification: l.latest
      ? {
          verdict: l.latest.verdict as Verification["verdict"],
          at: iso(l.latest.takenAt) ?? "",
          override: override(r.verifyOverrideAt, r.verifyOverrideById, r.verifyOverrideByName, r.verifyOverrideReason),
        }
      : null,
    verifyToleranceMm: r.verifyToleranceMm,
    notes: asCustomer ? "" : r.notes,
    version: r.version,
    createdAt: iso(r.createdAt) ?? "",
    updatedAt: iso(r.updatedAt) ?? "",
    createdBy: { id: r.createdBy, name: l.creatorName },
    moves,
    movesNeedingReason: moves.filter((to) => moveNeedsReason(status, to, actor, facts)),
  };
}

/** The job record if the caller may see it: staff of its shop, or its own customer once it is shared. */
export async function loadFor(caller: Caller, id: string): Promise<Loaded> {
  const db = await getDb();
  const [found] = await db
    .select({ record: j, creatorName: schema.user.name })
    .from(j)
    .innerJoin(schema.user, eq(schema.user.id, j.createdBy))
    .where(and(eq(j.id, id), eq(j.organizationId, caller.shopId)))
    .limit(1);
  if (!found) throw notFound();
  if (!isStaff(caller) && !(isJobCustomer(caller, found.record) && found.record.sharedAt !== null)) throw notFound();
  const latest = (await latestReadings([id])).get(id) ?? null;
  return { ...found, latest };
}

/** The job's record for other data modules (photos, payments) once the caller is allowed to see it. */
export async function jobFor(caller: Caller, id: string): Promise<{ record: jobs.JobRecord; view: JobView }> {
  const loaded = await loadFor(caller, id);
  return { record: loaded.record, view: view(caller, loaded) };
}
