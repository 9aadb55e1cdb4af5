import { evaluateStudy, type Study } from "@/geometry";
import type { PlanSnapshot } from "@/db/jobs";

// Invented demo data only: a job of the demo shop and the plan its card is printed from.

/** A job as the setup card reads it, with the owner's override of a cannot-fit plan when a reason is given. */
export const benchJob = (override: { reason: string } | null = null) => ({
  reference: "J-0042",
  title: "Bench test engine",
  customer: { name: "Quillfern Engine Works" },
  engineNumber: "E-1",
  caseNumber: "C-1",
  caseVariant: "",
  plan: { override: override ? { at: "2026-12-02T09:00:00.000Z", by: { id: "u1", name: "Ada Quillfern" }, reason: override.reason } : null },
});

/** The plan of the study for the kit at `kitIndex`, as the job keeps it, taken 2 Dec 2026 08:00 UTC. */
export function benchPlan(study: Study, kitIndex = 0): PlanSnapshot {
  const result = evaluateStudy(study);
  const k = result.kits[kitIndex];
  return { studyId: "s1", studyName: "Bench study", kitId: k.kitId, kitName: k.name, study, result, takenAt: "2026-12-02T08:00:00.000Z" };
}
