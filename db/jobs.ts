import "server-only";
import { randomUUID } from "node:crypto";
import { and, asc, count, desc, eq, inArray, isNotNull, isNull, like, or, sql, type SQL } from "drizzle-orm";
import type { Study, StudyResult } from "@/geometry";
import { ApiError } from "@/app/api/_lib/respond";
import type { JobCreate, JobListQuery, JobPatch } from "@/model/schemas/jobs";
import { AccessError, type Caller } from "./access";
import { appUrl } from "./auth";
import { getDb } from "./client";
import { DataError } from "./errors";
import { decideMove, movesFrom, STATUS_LABEL, isJobStatus, type JobStatus } from "@/model/job-status";
import { actionMail, sendMail } from "./mail";
import { SHOP_STAFF } from "./roles";
import * as schema from "./schema";
import * as jobs from "./schema-jobs";
import { evaluateStoredStudy, getStudy } from "./studies";
import { AfterCutReadingsSchema, planFromResult, verifyCut, VerificationPlanError, type AfterCutReadings, type Verification } from "./verification";

// Jobs: a customer's engine as a work order, from intake to closed. Every function takes the caller and
// checks the role and that the job belongs to the caller's shop; a customer reaches only their own jobs
// once shared with them. Another shop's job, or a job not shared with this customer, is a plain 404.

const j = jobs.job;

/** The plan as it was when the job was planned: the assembled Study and the core's result for it. */
export type PlanSnapshot = {
  studyId: string;
  studyName: string;
  kitId: string;
  kitName: string;
  study: Study;
  result: StudyResult;
  takenAt: string;
};

export type Person = { id: string; name: string };

export type JobView = {
  id: string;
  reference: string;
  title: string;
  status: JobStatus;
  statusLabel: string;
  customer: { name: string; email: string; userId: string | null };
  engineNumber: string;
  caseNumber: string;
  caseVariant: string;
  studyId: string | null;
  kitId: string | null;
  plan: { studyName: string; kitName: string; takenAt: string } | null;
  deposit: { amount: number; currency: string; paid: boolean; paidAt: string | null };
  sharedAt: string | null;
  approval: { at: string; by: Person; reason: string | null } | null;
  verification: { verdict: Verification["verdict"]; at: string } | null;
  verifyToleranceMm: number;
  notes: string;
  version: number;
  createdAt: string;
  updatedAt: string;
  createdBy: Person;
  /** The statuses this caller may try to move the job to (the server still decides). */
  moves: JobStatus[];
};

const iso = (d: Date | number | null | undefined) => (d === null || d === undefined ? null : new Date(d).toISOString());
const staff = (c: Caller) => SHOP_STAFF.includes(c.role);

function notFound(): AccessError {
  return new AccessError("not_found", "No job with this id in your shop.");
}

function assertStaff(caller: Caller) {
  if (!staff(caller)) throw new AccessError("forbidden", "Your role in this shop does not allow this.");
}

/** Whether the caller is this job's own customer (by account, or by the address the job was opened with). */
export function isJobCustomer(caller: Caller, r: jobs.JobRecord): boolean {
  if (caller.role !== "customer" || r.organizationId !== caller.shopId) return false;
  if (r.customerUserId) return r.customerUserId === caller.userId;
  return r.customerEmail.toLowerCase() === caller.email.toLowerCase();
}

export function parsePlan(r: jobs.JobRecord): PlanSnapshot | null {
  if (!r.planJson) return null;
  try {
    return JSON.parse(r.planJson) as PlanSnapshot;
  } catch {
    return null;
  }
}

type Loaded = { record: jobs.JobRecord; creatorName: string; latest: { verdict: string; takenAt: Date } | null };

async function latestReadings(jobIds: string[]): Promise<Map<string, { verdict: string; takenAt: Date; readings: AfterCutReadings; verification: Verification }>> {
  const out = new Map<string, { verdict: string; takenAt: Date; readings: AfterCutReadings; verification: Verification }>();
  if (jobIds.length === 0) return out;
  const db = await getDb();
  const rows = await db.select().from(jobs.jobReading).where(inArray(jobs.jobReading.jobId, jobIds)).orderBy(desc(jobs.jobReading.takenAt));
  for (const r of rows) {
    if (out.has(r.jobId)) continue;
    out.set(r.jobId, {
      verdict: r.verdict,
      takenAt: r.takenAt,
      readings: JSON.parse(r.readingsJson) as AfterCutReadings,
      verification: JSON.parse(r.verificationJson) as Verification,
    });
  }
  return out;
}

function view(caller: Caller, l: Loaded): JobView {
  const r = l.record;
  const plan = parsePlan(r);
  const status = isJobStatus(r.status) ? r.status : "intake";
  const asCustomer = caller.role === "customer";
  const moves = movesFrom(status).filter((to) => {
    const d = decideMove({ from: status, to, actor: { role: caller.role, isJobCustomer: isJobCustomer(caller, r) }, reason: "x", facts: { hasPlan: true, verification: "pass" } });
    return d.ok;
  });
  return {
    id: r.id,
    reference: r.reference,
    title: r.title,
    status,
    statusLabel: STATUS_LABEL[status],
    customer: { name: r.customerName, email: r.customerEmail, userId: r.customerUserId },
    engineNumber: r.engineNumber,
    caseNumber: r.caseNumber,
    caseVariant: r.caseVariant,
    studyId: asCustomer ? null : r.studyId,
    kitId: r.kitId,
    plan: plan ? { studyName: plan.studyName, kitName: plan.kitName, takenAt: plan.takenAt } : null,
    deposit: { amount: r.depositAmount, currency: r.currency, paid: r.paidAt !== null, paidAt: iso(r.paidAt) },
    sharedAt: iso(r.sharedAt),
    approval: r.approvedAt ? { at: iso(r.approvedAt) ?? "", by: { id: r.approvedById ?? "", name: r.approvedByName ?? "" }, reason: r.approvalReason } : null,
    verification: l.latest ? { verdict: l.latest.verdict as Verification["verdict"], at: iso(l.latest.takenAt) ?? "" } : null,
    verifyToleranceMm: r.verifyToleranceMm,
    notes: asCustomer ? "" : r.notes,
    version: r.version,
    createdAt: iso(r.createdAt) ?? "",
    updatedAt: iso(r.updatedAt) ?? "",
    createdBy: { id: r.createdBy, name: l.creatorName },
    moves,
  };
}

/** The job record if the caller may see it: staff of its shop, or its own customer once it is shared. */
async function loadFor(caller: Caller, id: string): Promise<Loaded> {
  const db = await getDb();
  const [found] = await db
    .select({ record: j, creatorName: schema.user.name })
    .from(j)
    .innerJoin(schema.user, eq(schema.user.id, j.createdBy))
    .where(and(eq(j.id, id), eq(j.organizationId, caller.shopId)))
    .limit(1);
  if (!found) throw notFound();
  if (!staff(caller) && !(isJobCustomer(caller, found.record) && found.record.sharedAt !== null)) throw notFound();
  const latest = (await latestReadings([id])).get(id) ?? null;
  return { ...found, latest };
}

/** The job's record for other data modules (photos, payments) once the caller is allowed to see it. */
export async function jobFor(caller: Caller, id: string): Promise<{ record: jobs.JobRecord; view: JobView }> {
  const loaded = await loadFor(caller, id);
  return { record: loaded.record, view: view(caller, loaded) };
}

// ── Reading ─────────────────────────────────────────────────────────────────────────────────────

function customerFilter(caller: Caller): SQL | undefined {
  return and(
    isNotNull(j.sharedAt),
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
  const scope = and(eq(j.organizationId, caller.shopId), staff(caller) ? undefined : customerFilter(caller));
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

/** Everything the job page and the consult page show: the job, its plan, latest readings and verification, history, questions. */
export async function jobDetail(caller: Caller, id: string) {
  const loaded = await loadFor(caller, id);
  const db = await getDb();
  const plan = parsePlan(loaded.record);
  const latest = (await latestReadings([id])).get(id) ?? null;
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

// ── Writing ─────────────────────────────────────────────────────────────────────────────────────

type Tx = Parameters<Parameters<Awaited<ReturnType<typeof getDb>>["transaction"]>[0]>[0];

async function addEvent(tx: Tx, jobId: string, by: Person | null, kind: string, summary: string, move?: { from: string; to: string }) {
  await tx.insert(jobs.jobEvent).values({
    id: randomUUID(),
    jobId,
    at: new Date(),
    byId: by?.id ?? null,
    byName: by?.name ?? "payment service",
    kind,
    fromStatus: move?.from ?? null,
    toStatus: move?.to ?? null,
    summary,
  });
}

/** The plan for a study and kit of the caller's shop, evaluated now by the core. */
async function snapshotPlan(caller: Caller, studyId: string, kitId: string | null | undefined): Promise<PlanSnapshot> {
  let evaluated: { study: Study; result: StudyResult };
  let chosen: string | null = null;
  let studyName = "";
  try {
    const { item } = await getStudy(caller, studyId);
    chosen = item.chosenKitId;
    studyName = item.name;
    const found = await evaluateStoredStudy(caller.shopId, studyId);
    if (!found) throw new AccessError("not_found", "No study with this id in your shop.");
    evaluated = found;
  } catch (error) {
    if (error instanceof AccessError && error.code === "not_found") throw new ApiError(400, "invalid_input", "Some fields are not valid.", { studyId: "No study with this id in your shop." });
    if (error instanceof DataError) throw new ApiError(422, error.code, `The study cannot give a plan yet: ${error.message}`, error.fields);
    throw error;
  }
  const pick = kitId ?? chosen ?? evaluated.study.kits[0]?.id;
  const kit = evaluated.result.kits.find((k) => k.kitId === pick);
  if (!kit) throw new ApiError(400, "invalid_input", "Some fields are not valid.", { kitId: "Choose one of the study's kits." });
  if (!kit.cut) throw new ApiError(422, "no_cut", `The study gives no cut for ${kit.name}; plan the cut in the study first.`, { kitId: "This kit has no cut to make." });
  return { studyId, studyName, kitId: kit.kitId, kitName: kit.name, study: evaluated.study, result: evaluated.result, takenAt: new Date().toISOString() };
}

/** The user id of a customer member of the shop with this e-mail, if any. */
async function customerMemberId(shopId: string, email: string): Promise<string | null> {
  const db = await getDb();
  const [found] = await db
    .select({ id: schema.user.id })
    .from(schema.member)
    .innerJoin(schema.user, eq(schema.user.id, schema.member.userId))
    .where(and(eq(schema.member.organizationId, shopId), eq(schema.member.role, "customer"), sql`lower(${schema.user.email}) = ${email.toLowerCase()}`))
    .limit(1);
  return found?.id ?? null;
}

async function nextReference(tx: Tx, shopId: string): Promise<string> {
  const [row] = await tx.select({ n: count() }).from(j).where(eq(j.organizationId, shopId));
  let n = (row?.n ?? 0) + 1;
  for (;;) {
    const ref = `J-${String(n).padStart(4, "0")}`;
    const [taken] = await tx.select({ id: j.id }).from(j).where(and(eq(j.organizationId, shopId), eq(j.reference, ref))).limit(1);
    if (!taken) return ref;
    n++;
  }
}

/** Opens a job at intake (or planned straight away when a study with a cut is attached). */
export async function createJob(caller: Caller, body: JobCreate): Promise<JobView> {
  assertStaff(caller);
  const plan = body.studyId ? await snapshotPlan(caller, body.studyId, body.kitId) : null;
  const customerUserId = await customerMemberId(caller.shopId, body.customerEmail);
  const id = randomUUID();
  const db = await getDb();
  const me = { id: caller.userId, name: caller.name };
  await db.transaction(async (tx) => {
    const reference = await nextReference(tx, caller.shopId);
    await tx.insert(j).values({
      id,
      organizationId: caller.shopId,
      reference,
      title: body.title,
      customerUserId,
      customerName: body.customerName,
      customerEmail: body.customerEmail,
      engineNumber: body.engineNumber ?? "",
      caseNumber: body.caseNumber ?? "",
      caseVariant: body.caseVariant ?? "",
      studyId: plan?.studyId ?? null,
      kitId: plan?.kitId ?? null,
      planJson: plan ? JSON.stringify(plan) : null,
      status: "intake",
      depositAmount: body.depositAmount ?? 0,
      currency: body.currency ?? "eur",
      verifyToleranceMm: body.verifyToleranceMm ?? 0.05,
      notes: body.notes ?? "",
      createdBy: caller.userId,
    });
    await addEvent(tx, id, me, "created", `opened the job for ${body.customerName}`);
    if (plan) {
      await tx.update(j).set({ status: "planned" }).where(eq(j.id, id));
      await addEvent(tx, id, me, "status", `planned with ${plan.kitName} from the study "${plan.studyName}"`, { from: "intake", to: "planned" });
    }
  });
  return getJob(caller, id);
}

/** Changes the job's details; a new study or kit re-takes the plan, which is fixed once approved. */
export async function updateJob(caller: Caller, id: string, patch: JobPatch): Promise<JobView> {
  assertStaff(caller);
  const { record } = await loadFor(caller, id);
  if (record.version !== patch.version) throw new ApiError(409, "conflict", "Someone else changed this job since you opened it. Reload to see their change; your edits are kept.");
  if (patch.depositAmount !== undefined && record.paidAt !== null && patch.depositAmount !== record.depositAmount)
    throw new ApiError(409, "paid", "The deposit was paid already; its amount cannot change.", { depositAmount: "Already paid." });
  const replan = patch.studyId !== undefined || patch.kitId !== undefined;
  const status = record.status as JobStatus;
  if (replan && status !== "intake" && status !== "planned")
    throw new ApiError(409, "plan_fixed", "The plan is fixed once approved: move the job back to planned, with a reason, before changing it.");
  const studyId = patch.studyId === undefined ? record.studyId : patch.studyId;
  const plan = replan && studyId ? await snapshotPlan(caller, studyId, patch.kitId === undefined ? record.kitId : patch.kitId) : undefined;
  const emailChanged = patch.customerEmail !== undefined && patch.customerEmail !== record.customerEmail.toLowerCase();
  const customerUserId = emailChanged ? await customerMemberId(caller.shopId, patch.customerEmail ?? "") : record.customerUserId;
  const db = await getDb();
  await db.transaction(async (tx) => {
    const set: Partial<jobs.JobRecord> = {
      ...(patch.title !== undefined ? { title: patch.title } : {}),
      ...(patch.customerName !== undefined ? { customerName: patch.customerName } : {}),
      ...(patch.customerEmail !== undefined ? { customerEmail: patch.customerEmail, customerUserId } : {}),
      ...(patch.engineNumber !== undefined ? { engineNumber: patch.engineNumber } : {}),
      ...(patch.caseNumber !== undefined ? { caseNumber: patch.caseNumber } : {}),
      ...(patch.caseVariant !== undefined ? { caseVariant: patch.caseVariant } : {}),
      ...(patch.depositAmount !== undefined && record.paidAt === null ? { depositAmount: patch.depositAmount } : {}),
      ...(patch.currency !== undefined && record.paidAt === null ? { currency: patch.currency } : {}),
      ...(patch.verifyToleranceMm !== undefined ? { verifyToleranceMm: patch.verifyToleranceMm } : {}),
      ...(patch.notes !== undefined ? { notes: patch.notes } : {}),
    };
    if (replan) {
      set.studyId = plan?.studyId ?? null;
      set.kitId = plan?.kitId ?? null;
      set.planJson = plan ? JSON.stringify(plan) : null;
      if (!plan && status === "planned") set.status = "intake";
    }
    const done = await tx
      .update(j)
      .set({ ...set, version: record.version + 1, updatedAt: new Date() })
      .where(and(eq(j.id, id), eq(j.version, record.version)))
      .returning({ id: j.id });
    if (done.length === 0) throw new ApiError(409, "conflict", "Someone else changed this job since you opened it. Reload to see their change; your edits are kept.");
    const me = { id: caller.userId, name: caller.name };
    if (replan) await addEvent(tx, id, me, "plan", plan ? `took the plan: ${plan.kitName} from "${plan.studyName}"` : "removed the plan");
    else await addEvent(tx, id, me, "edit", "changed the job's details");
  });
  return getJob(caller, id);
}

/** Moves the job to another status, when the status machine allows it for this caller. */
export async function moveJob(caller: Caller, id: string, to: JobStatus, reason?: string): Promise<JobView> {
  const { record, latest } = await loadFor(caller, id);
  const from = record.status as JobStatus;
  const decision = decideMove({
    from,
    to,
    actor: { role: caller.role, isJobCustomer: isJobCustomer(caller, record) },
    reason,
    facts: { hasPlan: record.planJson !== null, verification: (latest?.verdict as Verification["verdict"] | undefined) ?? null },
  });
  if (!decision.ok) {
    const status = decision.code === "forbidden" ? 403 : decision.code === "reason_required" ? 400 : 409;
    throw new ApiError(status, decision.code === "forbidden" ? "forbidden" : decision.code === "reason_required" ? "reason_required" : "move_refused", decision.message, decision.code === "reason_required" ? { reason: decision.message } : undefined);
  }
  const db = await getDb();
  const me = { id: caller.userId, name: caller.name };
  const why = reason?.trim() || null;
  await db.transaction(async (tx) => {
    const set: Partial<jobs.JobRecord> = { status: to, version: record.version + 1, updatedAt: new Date() };
    if (to === "approved") {
      set.approvedAt = new Date();
      set.approvedById = caller.userId;
      set.approvedByName = caller.name;
      set.approvalReason = caller.role === "customer" ? null : why;
      if (caller.role === "customer" && !record.customerUserId) set.customerUserId = caller.userId;
    }
    if (from === "approved" && to === "planned") {
      set.approvedAt = null;
      set.approvedById = null;
      set.approvedByName = null;
      set.approvalReason = null;
    }
    const done = await tx.update(j).set(set).where(and(eq(j.id, id), eq(j.status, from))).returning({ id: j.id });
    if (done.length === 0) throw new ApiError(409, "conflict", "The job moved on since you opened it. Reload to see where it is now.");
    const summary =
      to === "approved"
        ? caller.role === "customer"
          ? "approved the plan"
          : `approved the plan for the customer: ${why}`
        : `moved the job from ${STATUS_LABEL[from].toLowerCase()} to ${STATUS_LABEL[to].toLowerCase()}${why ? `: ${why}` : ""}`;
    await addEvent(tx, id, me, "status", summary, { from, to });
  });
  if (to === "approved") await mailShop(caller.shopId, record, `${record.reference}: plan approved`, [`${caller.name} approved the plan for ${record.title}.`]);
  return getJob(caller, id);
}

/** Records after-cut readings, verifies them against the plan and keeps both; the job must be machined. */
export async function recordReadings(caller: Caller, id: string, body: AfterCutReadings) {
  assertStaff(caller);
  const readings = AfterCutReadingsSchema.parse(body);
  const { record } = await loadFor(caller, id);
  if (record.status !== "machined") {
    throw new ApiError(409, "wrong_status", record.status === "verified" || record.status === "closed"
      ? "The job is verified already; move it back to machined, with a reason, to record new readings."
      : "Record the after-cut readings once the job is machined.");
  }
  const plan = parsePlan(record);
  if (!plan) throw new ApiError(409, "no_plan", "The job has no plan to verify against.");
  let verification: Verification;
  try {
    verification = verifyCut(planFromResult(plan.result, plan.kitId), readings, record.verifyToleranceMm);
  } catch (error) {
    if (error instanceof VerificationPlanError) throw new ApiError(409, "no_plan", error.message);
    throw error;
  }
  const db = await getDb();
  const me = { id: caller.userId, name: caller.name };
  await db.transaction(async (tx) => {
    await tx.insert(jobs.jobReading).values({
      id: randomUUID(),
      jobId: id,
      readingsJson: JSON.stringify(readings),
      verificationJson: JSON.stringify(verification),
      verdict: verification.verdict,
      takenAt: new Date(),
      takenById: caller.userId,
      takenByName: caller.name,
    });
    const failing = verification.checks.filter((c) => c.state !== "ok").map((c) => c.label.toLowerCase());
    await addEvent(tx, id, me, "readings", verification.verdict === "pass" ? "recorded after-cut readings: within the plan" : `recorded after-cut readings: ${verification.verdict} (${failing.join(", ")})`);
    await tx.update(j).set({ updatedAt: new Date(), version: record.version + 1 }).where(eq(j.id, id));
  });
  return { verification, job: await getJob(caller, id) };
}

// ── Sharing with the customer ───────────────────────────────────────────────────────────────────

const INVITATION_DAYS = 7;

/** Mails the shop's owners (and the job's creator) about something the customer did. */
async function mailShop(shopId: string, record: jobs.JobRecord, subject: string, lines: string[]) {
  const db = await getDb();
  const people = await db
    .select({ email: schema.user.email, id: schema.user.id, role: schema.member.role })
    .from(schema.member)
    .innerJoin(schema.user, eq(schema.user.id, schema.member.userId))
    .where(and(eq(schema.member.organizationId, shopId), inArray(schema.member.role, ["owner", "builder"])));
  const to = [...new Set(people.filter((p) => p.role === "owner" || p.id === record.createdBy).map((p) => p.email))];
  for (const address of to) {
    try {
      await sendMail(actionMail(address, subject, lines, { label: "Open the job", url: `${appUrl()}/jobs/${record.id}` }));
    } catch {
      // Logged by sendMail; what the customer did is already kept on the job.
    }
  }
}

/**
 * Shares the job's plan with its customer: a customer already in the shop gets the consult link; anyone
 * else is invited into the shop with the customer role, the link to accept in the same mail.
 */
export async function shareJob(caller: Caller, id: string): Promise<{ job: JobView; invited: boolean }> {
  assertStaff(caller);
  const { record } = await loadFor(caller, id);
  if (!record.planJson) throw new ApiError(409, "no_plan", "Attach a study and choose its kit before sharing the plan.");
  const db = await getDb();
  const email = record.customerEmail.toLowerCase();
  const memberId = record.customerUserId ?? (await customerMemberId(caller.shopId, email));
  const [staffWithEmail] = await db
    .select({ id: schema.user.id })
    .from(schema.member)
    .innerJoin(schema.user, eq(schema.user.id, schema.member.userId))
    .where(and(eq(schema.member.organizationId, caller.shopId), inArray(schema.member.role, ["owner", "builder"]), sql`lower(${schema.user.email}) = ${email}`))
    .limit(1);
  if (staffWithEmail) throw new ApiError(409, "customer_is_staff", "That address belongs to a member of the shop's staff; give the customer's own address.", { customerEmail: "This address belongs to the shop's staff." });
  const consultUrl = `${appUrl()}/consult/${record.id}`;
  const shop = await db.query.organization.findFirst({ where: eq(schema.organization.id, caller.shopId) });
  const shopName = shop?.name ?? caller.shopName;
  let invitationId: string | null = null;
  await db.transaction(async (tx) => {
    if (!memberId) {
      // The invitation the sign-in library's organization plugin reads and accepts; written here so a
      // builder (whose role may not invite staff) can still bring a customer in.
      await tx
        .update(schema.invitation)
        .set({ status: "canceled" })
        .where(and(eq(schema.invitation.organizationId, caller.shopId), sql`lower(${schema.invitation.email}) = ${email}`, eq(schema.invitation.status, "pending")));
      invitationId = randomUUID();
      await tx.insert(schema.invitation).values({
        id: invitationId,
        organizationId: caller.shopId,
        email,
        role: "customer",
        status: "pending",
        expiresAt: new Date(Date.now() + INVITATION_DAYS * 24 * 3600 * 1000),
        createdAt: new Date(),
        inviterId: caller.userId,
      });
    }
    await tx.update(j).set({ sharedAt: record.sharedAt ?? new Date(), customerUserId: memberId, updatedAt: new Date(), version: record.version + 1 }).where(eq(j.id, id));
    await addEvent(tx, id, { id: caller.userId, name: caller.name }, "share", memberId ? `shared the plan with ${record.customerName}` : `shared the plan and invited ${record.customerName} into the shop`);
  });
  const lines = [
    `Hello ${record.customerName},`,
    `${shopName} has prepared the plan for your engine (${record.title}): what each candidate kit gives, what must be cut, the risks and the price.`,
    "Look it over, ask the shop anything, and approve it when you are ready.",
  ];
  const mail = invitationId
    ? actionMail(email, `${shopName} shares the plan for your engine`, [
        ...lines,
        `First create your account (or sign in) and join ${shopName} as a customer; the plan is then at ${consultUrl}`,
        `The invitation is open for ${INVITATION_DAYS} days.`,
      ], { label: "Join and see the plan", url: `${appUrl()}/invite/${invitationId}` })
    : actionMail(email, `${shopName} shares the plan for your engine`, lines, { label: "See the plan", url: consultUrl });
  try {
    await sendMail(mail);
  } catch {
    throw new ApiError(502, "mail_failed", "The plan is shared, but the e-mail could not be sent. Try sharing again in a moment.");
  }
  return { job: await getJob(caller, id), invited: invitationId !== null };
}

/** A question from the customer about the plan: kept on the job and mailed to the shop. */
export async function askQuestion(caller: Caller, id: string, textIn: string) {
  const { record } = await loadFor(caller, id);
  if (!isJobCustomer(caller, record) && !staff(caller)) throw notFound();
  const db = await getDb();
  const q = { id: randomUUID(), jobId: id, at: new Date(), byId: caller.userId, byName: caller.name, text: textIn.trim() };
  await db.transaction(async (tx) => {
    await tx.insert(jobs.jobQuestion).values(q);
    await addEvent(tx, id, { id: caller.userId, name: caller.name }, "question", `asked: ${q.text.slice(0, 140)}`);
  });
  if (caller.role === "customer") await mailShop(caller.shopId, record, `${record.reference}: a question from ${caller.name}`, [`${caller.name} asks about ${record.title}:`, q.text]);
  return { id: q.id, at: q.at.toISOString(), by: { id: caller.userId, name: caller.name }, text: q.text };
}
