import "server-only";
import type { Study, StudyResult } from "@/geometry";
import { decidePlan } from "@/model/job-status";
import { AccessError, type Caller } from "../access";
import { DataError } from "../errors";
import { evaluateStoredStudy, getStudy } from "../studies";
import type { PlanSnapshot } from "./view";

// Taking a plan: the study evaluated now by the core, the chosen kit, and whether the caller may plan it.

/** The plan for a study and kit of the caller's shop, evaluated now by the core. */
export async function snapshotPlan(caller: Caller, studyId: string, kitId: string | null | undefined): Promise<PlanSnapshot> {
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
    if (error instanceof AccessError && error.code === "not_found") throw new DataError("invalid_input", "Some fields are not valid.", { studyId: "No study with this id in your shop." });
    if (error instanceof DataError) throw new DataError(error.code, `The study cannot give a plan yet: ${error.message}`, error.fields);
    throw error;
  }
  const pick = kitId ?? chosen ?? evaluated.study.kits[0]?.id;
  const kit = evaluated.result.kits.find((k) => k.kitId === pick);
  if (!kit) throw new DataError("invalid_input", "Some fields are not valid.", { kitId: "Choose one of the study's kits." });
  if (!kit.cut) throw new DataError("no_cut", `The study gives no cut for ${kit.name}; plan the cut in the study first.`, { kitId: "This kit has no cut to make." });
  return { studyId, studyName, kitId: kit.kitId, kitName: kit.name, study: evaluated.study, result: evaluated.result, takenAt: new Date().toISOString() };
}

/**
 * Whether the caller may plan this snapshot: a kit the study calls cannot-fit needs the owner and a reason.
 * Returns the override to record (null when none is needed); throws the refusal otherwise.
 */
export function checkPlan(caller: Caller, plan: PlanSnapshot, reason: string | undefined, field = "planOverrideReason"): { reason: string } | null {
  const verdict = plan.result.kits.find((k) => k.kitId === plan.kitId)?.verdict ?? null;
  const decision = decidePlan({ verdict, actor: { role: caller.role, isJobCustomer: false }, reason });
  if (!decision.ok) {
    if (decision.code === "forbidden") throw new AccessError("forbidden", decision.message);
    throw new DataError("reason_required", decision.message, { [field]: decision.message });
  }
  return decision.override ? { reason: (reason ?? "").trim() } : null;
}

/** The columns that record an owner's override of a cannot-fit plan (all null to clear it). */
export function planOverrideColumns(caller: Caller, override: { reason: string } | null) {
  return override
    ? { planOverrideReason: override.reason, planOverrideById: caller.userId, planOverrideByName: caller.name, planOverrideAt: new Date() }
    : { planOverrideReason: null, planOverrideById: null, planOverrideByName: null, planOverrideAt: null };
}
