import "server-only";
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import type { Caller } from "../access";
import { getDb } from "../client";
import { DataError } from "../errors";
import * as jobs from "../schema-jobs";
import { AfterCutReadingsSchema, planFromResult, verifyCut, VerificationPlanError, type AfterCutReadings, type Verification } from "../verification";
import { addEvent } from "./events";
import { getJob } from "./reads";
import { assertStaff, j, loadFor, parsePlan } from "./view";

// After-cut readings: what was actually cut, verified against the plan and kept with the verdict.

/** Records after-cut readings, verifies them against the plan and keeps both; the job must be machined. */
export async function recordReadings(caller: Caller, id: string, body: AfterCutReadings) {
  assertStaff(caller);
  const readings = AfterCutReadingsSchema.parse(body);
  const { record } = await loadFor(caller, id);
  if (record.status !== "machined") {
    throw new DataError("wrong_status", record.status === "verified" || record.status === "closed"
      ? "The job is verified already; move it back to machined, with a reason, to record new readings."
      : "Record the after-cut readings once the job is machined.");
  }
  const plan = parsePlan(record);
  if (!plan) throw new DataError("no_plan", "The job has no plan to verify against.");
  let verification: Verification;
  try {
    verification = verifyCut(planFromResult(plan.result, plan.kitId), readings, record.verifyToleranceMm);
  } catch (error) {
    if (error instanceof VerificationPlanError) throw new DataError("no_plan", error.message);
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
