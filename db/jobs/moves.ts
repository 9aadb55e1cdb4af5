import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import { decideMove, STATUS_LABEL, type JobStatus } from "@/model/job-status";
import { AccessError, type Caller } from "../access";
import { getDb } from "../client";
import { DataError } from "../errors";
import type * as jobs from "../schema-jobs";
import { addEvent, mailShop } from "./events";
import { approvalWords } from "./quote-view";
import { getJob } from "./reads";
import { isJobCustomer, j, loadFor, moveFacts, type JobView } from "./view";

// Moving a job along its life, as the status machine (model/job-status.ts) allows; the overrides an owner
// records on the way (a cannot-fit plan, readings outside the plan) are kept on the job with who and when.

/** The history line of a move. */
function summaryOf(caller: Caller, record: jobs.JobRecord, to: JobStatus, why: string | null, kind: "plan" | "verify" | null): string {
  const from = record.status as JobStatus;
  if (to === "approved") {
    const what = approvalWords(record);
    if (caller.role === "customer") return `approved ${what}`;
    return why ? `approved ${what} for the customer: ${why}` : `approved ${what} for the shop's own engine`;
  }
  if (kind === "plan") return `planned the job although the study says the kit cannot fit safely, on the owner's override: ${why}`;
  if (kind === "verify") return `verified the job although the after-cut readings are outside the plan, on the owner's override: ${why}`;
  return `moved the job from ${STATUS_LABEL[from].toLowerCase()} to ${STATUS_LABEL[to].toLowerCase()}${why ? `: ${why}` : ""}`;
}

/** Moves the job to another status, when the status machine allows it for this caller. */
export async function moveJob(caller: Caller, id: string, to: JobStatus, reason?: string, check?: (record: jobs.JobRecord) => void): Promise<JobView> {
  const { record, latest } = await loadFor(caller, id);
  check?.(record);
  const from = record.status as JobStatus;
  const facts = moveFacts(record, latest);
  const decision = decideMove({ from, to, actor: { role: caller.role, isJobCustomer: isJobCustomer(caller, record) }, reason, facts });
  if (!decision.ok) {
    if (decision.code === "forbidden") throw new AccessError("forbidden", decision.message);
    if (decision.code === "reason_required") throw new DataError("reason_required", decision.message, { reason: decision.message });
    throw new DataError("move_refused", decision.message);
  }
  const why = reason?.trim() || null;
  const now = new Date();
  const me = { id: caller.userId, name: caller.name };
  const override =
    from === "intake" && to === "planned" && facts.planVerdict === "cannot-fit" && !facts.planOverridden
      ? "plan"
      : to === "verified" && facts.verification === "fail"
        ? "verify"
        : null;
  const set: Partial<jobs.JobRecord> = { status: to, version: record.version + 1, updatedAt: now };
  if (to === "approved") {
    set.approvedAt = now;
    set.approvedById = caller.userId;
    set.approvedByName = caller.name;
    set.approvalReason = caller.role === "customer" ? null : why;
    // One approval takes the plan and the quote together: the quote is kept as approved, fixed from now on.
    set.approvedQuoteJson = record.quoteJson;
    if (caller.role === "customer" && !record.customerUserId) set.customerUserId = caller.userId;
  }
  if (from === "approved" && to === "planned") Object.assign(set, { approvedAt: null, approvedById: null, approvedByName: null, approvalReason: null, approvedQuoteJson: null });
  if (override === "plan") Object.assign(set, { planOverrideReason: why, planOverrideById: caller.userId, planOverrideByName: caller.name, planOverrideAt: now });
  if (override === "verify") Object.assign(set, { verifyOverrideReason: why, verifyOverrideById: caller.userId, verifyOverrideByName: caller.name, verifyOverrideAt: now });
  if (from === "verified" && to === "machined") Object.assign(set, { verifyOverrideReason: null, verifyOverrideById: null, verifyOverrideByName: null, verifyOverrideAt: null });
  const db = await getDb();
  await db.transaction(async (tx) => {
    // An approval takes the quote that was read: none written meanwhile, none changed.
    const sameQuote = to === "approved" ? (record.quoteJson === null ? isNull(j.quoteJson) : eq(j.quoteJson, record.quoteJson)) : undefined;
    const done = await tx.update(j).set(set).where(and(eq(j.id, id), eq(j.status, from), sameQuote)).returning({ id: j.id });
    if (done.length === 0) throw new DataError("conflict", "The job moved on since you opened it. Reload to see where it is now.");
    await addEvent(tx, id, me, "status", summaryOf(caller, record, to, why, override), { from, to });
  });
  if (to === "approved" && !record.ownEngine) await mailShop(caller.shopId, record, `${record.reference}: plan approved`, [`${caller.name} approved ${approvalWords(record)} for ${record.title}.`]);
  return getJob(caller, id);
}
