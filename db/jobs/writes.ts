import "server-only";
import { randomUUID } from "node:crypto";
import { and, count, eq, sql } from "drizzle-orm";
import type { JobStatus } from "@/model/job-status";
import type { JobCreate, JobPatch } from "@/model/schemas/jobs";
import type { Caller } from "../access";
import { getDb } from "../client";
import { DataError } from "../errors";
import * as schema from "../schema";
import * as jobs from "../schema-jobs";
import { addEvent, type Tx } from "./events";
import { shopPricing } from "../settings";
import { checkPlan, planOverrideColumns, snapshotPlan } from "./plan";
import { requoteForKit } from "./quote";
import { getJob } from "./reads";
import { assertStaff, j, loadFor, planVerdict, type JobView } from "./view";

// Opening a job and changing its details; a new study or kit re-takes the plan.

const STALE = "Someone else changed this job since you opened it. Reload to see their change; your edits are kept.";

/** The user id of a customer member of the shop with this e-mail, if any. */
export async function customerMemberId(shopId: string, email: string): Promise<string | null> {
  if (!email) return null;
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

/**
 * Opens a job at intake, planned straight away when a study with a cut is attached. A kit the study calls
 * cannot-fit is planned only by the owner with a recorded reason (without one nothing is written); a builder's
 * job with such a kit opens at intake with the plan attached, for the owner to decide.
 */
export async function createJob(caller: Caller, body: JobCreate): Promise<JobView> {
  assertStaff(caller);
  const plan = body.studyId ? await snapshotPlan(caller, body.studyId, body.kitId) : null;
  // A builder may open the job with a cannot-fit plan attached; it stays at intake until the owner plans it.
  const waitsForOwner = plan !== null && caller.role !== "owner" && planVerdict(plan) === "cannot-fit";
  const override = plan && !waitsForOwner ? checkPlan(caller, plan, body.planOverrideReason) : null;
  const own = body.ownEngine === true;
  const customerName = own ? caller.shopName : (body.customerName ?? "");
  const customerEmail = own ? "" : (body.customerEmail ?? "");
  const customerUserId = own ? null : await customerMemberId(caller.shopId, customerEmail);
  const id = randomUUID();
  // Until a quote sets the deposit, the job is in the shop's currency.
  const currency = (await shopPricing(caller.shopId)).currency.toLowerCase();
  const db = await getDb();
  const me = { id: caller.userId, name: caller.name };
  await db.transaction(async (tx) => {
    const reference = await nextReference(tx, caller.shopId);
    await tx.insert(j).values({
      id,
      organizationId: caller.shopId,
      reference,
      title: body.title,
      ownEngine: own,
      customerUserId,
      customerName,
      customerEmail,
      engineNumber: body.engineNumber ?? "",
      caseNumber: body.caseNumber ?? "",
      caseVariant: body.caseVariant ?? "",
      studyId: plan?.studyId ?? null,
      kitId: plan?.kitId ?? null,
      planJson: plan ? JSON.stringify(plan) : null,
      status: plan && !waitsForOwner ? "planned" : "intake",
      ...planOverrideColumns(caller, override),
      depositAmount: own ? 0 : (body.depositAmount ?? 0),
      currency: body.currency ?? currency,
      verifyToleranceMm: body.verifyToleranceMm ?? 0.05,
      notes: body.notes ?? "",
      createdBy: caller.userId,
    });
    await addEvent(tx, id, me, "created", own ? "opened the job for the shop's own engine" : `opened the job for ${customerName}`);
    if (plan && waitsForOwner) {
      await addEvent(tx, id, me, "plan", `attached the plan: ${plan.kitName} from "${plan.studyName}"; the study says it cannot fit safely, so planning it needs the owner's override`);
    } else if (plan) {
      const how = override ? ` although the study says it cannot fit safely, on the owner's override: ${override.reason}` : "";
      await addEvent(tx, id, me, "status", `planned with ${plan.kitName} from the study "${plan.studyName}"${how}`, { from: "intake", to: "planned" });
    }
  });
  return getJob(caller, id);
}

/** Changes the job's details; a new study or kit re-takes the plan, which is fixed once approved. */
export async function updateJob(caller: Caller, id: string, patch: JobPatch): Promise<JobView> {
  assertStaff(caller);
  const { record } = await loadFor(caller, id);
  if (record.version !== patch.version) throw new DataError("conflict", STALE);
  if (record.quoteJson !== null && ((patch.depositAmount !== undefined && patch.depositAmount !== record.depositAmount) || (patch.currency !== undefined && patch.currency !== record.currency)))
    throw new DataError("invalid_input", "The deposit comes from the job's quote; an owner sets a different one there, with a reason.", {
      [patch.depositAmount !== undefined ? "depositAmount" : "currency"]: "Set by the quote.",
    });
  if (patch.depositAmount !== undefined && record.paidAt !== null && patch.depositAmount !== record.depositAmount)
    throw new DataError("paid", "The deposit was paid already; its amount cannot change.", { depositAmount: "Already paid." });
  if (record.ownEngine && (patch.customerName !== undefined || patch.customerEmail !== undefined))
    throw new DataError("invalid_input", "This job is the shop's own engine; it has no customer.", { customerEmail: "The shop's own engine has no customer." });
  const replan = patch.studyId !== undefined || patch.kitId !== undefined;
  const status = record.status as JobStatus;
  if (replan && status !== "intake" && status !== "planned")
    throw new DataError("plan_fixed", "The plan is fixed once approved: move the job back to planned, with a reason, before changing it.");
  const studyId = patch.studyId === undefined ? record.studyId : patch.studyId;
  // Another study without a kit named takes that study's chosen kit, not the old study's.
  const kitId = patch.kitId !== undefined ? patch.kitId : patch.studyId !== undefined && patch.studyId !== record.studyId ? null : record.kitId;
  const plan = replan && studyId ? await snapshotPlan(caller, studyId, kitId) : undefined;
  // A planned job keeps its status only with a plan this caller may plan; an intake job is planned by a move later.
  const backToIntake = plan !== undefined && status === "planned" && caller.role !== "owner" && planVerdict(plan) === "cannot-fit";
  const override = plan && status === "planned" && !backToIntake ? checkPlan(caller, plan, patch.planOverrideReason) : null;
  const emailChanged = patch.customerEmail !== undefined && patch.customerEmail !== record.customerEmail.toLowerCase();
  const customerUserId = emailChanged ? await customerMemberId(caller.shopId, patch.customerEmail ?? "") : record.customerUserId;
  // Another kit re-prices the quote's kit line (or takes it out, saying why): the old kit never stays silently.
  const requote = replan ? await requoteForKit(caller.shopId, record, plan ?? null) : null;
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
      Object.assign(set, planOverrideColumns(caller, override));
      if ((!plan || backToIntake) && status === "planned") set.status = "intake";
      if (requote && record.paidAt === null) Object.assign(set, { quoteJson: requote.quoteJson, depositAmount: requote.depositAmount });
    }
    const done = await tx
      .update(j)
      .set({ ...set, version: record.version + 1, updatedAt: new Date() })
      .where(and(eq(j.id, id), eq(j.version, record.version)))
      .returning({ id: j.id });
    if (done.length === 0) throw new DataError("conflict", STALE);
    const me = { id: caller.userId, name: caller.name };
    if (replan) {
      const how = override ? ` although the study says it cannot fit safely, on the owner's override: ${override.reason}` : "";
      const waits = backToIntake ? "; the study says it cannot fit safely, so the job is back at intake until the owner plans it" : "";
      await addEvent(tx, id, me, "plan", plan ? `took the plan: ${plan.kitName} from "${plan.studyName}"${how}${waits}` : "removed the plan");
      if (requote?.summary && record.paidAt === null) await addEvent(tx, id, me, "quote", requote.summary);
    } else await addEvent(tx, id, me, "edit", "changed the job's details");
  });
  return getJob(caller, id);
}
