// After-cut verification: what was actually cut, compared with the plan the core gave for the chosen kit.
// Pure: no I/O and no server-only import, so the job page, the API and the tests share one comparison.
import type { KitResult, StudyResult } from "@/geometry";
import { TRIAL_FIT_LABEL, type AfterCutReadings } from "@/model/schemas/jobs";

/**
 * How far a measured cut may sit from the planned one, mm. Common practice, no published source (a cut
 * set with a caliper read to 0.05 mm and measured the same way cannot be judged finer than that).
 */
export const DEFAULT_VERIFY_TOLERANCE_MM = 0.05;

// The readings' shape is a request schema; it lives with the other job requests.
export { AfterCutReadingsSchema, TRIAL_FIT, TRIAL_FIT_LABEL, type AfterCutReadings, type TrialFit } from "@/model/schemas/jobs";

/** The planned figures the readings are compared with, taken from the core's result for one kit. */
export type VerificationPlan = {
  kitName: string;
  cutDiameterMm: number;
  cutDepthMm: number;
  /** The cut opens into the crank chamber, so no step remains and depth clearance does not apply. */
  throughMouth: boolean;
  skirtDiameterMm: number;
  skirtLengthMm: number;
  minRadialClearanceMm: number;
  minDepthClearanceMm: number;
  minSealingLandMm: number;
  /** The sealing land the plan leaves at each stud. */
  studs: { label: string; plannedMm: number }[];
};

export class VerificationPlanError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "VerificationPlanError";
  }
}

/** The verification plan for one kit of a study result; throws when the kit has no cut. */
export function planFromResult(result: StudyResult, kitId: string): VerificationPlan {
  const kit: KitResult | undefined = result.kits.find((k) => k.kitId === kitId);
  if (!kit) throw new VerificationPlanError("The chosen kit is not in the study's results.");
  if (!kit.cut) throw new VerificationPlanError("The plan for this kit has no cut to verify.");
  const v = result.limits.values;
  return {
    kitName: kit.name,
    cutDiameterMm: kit.cut.diameterMm,
    cutDepthMm: kit.cut.depthMm,
    throughMouth: kit.cut.throughMouth,
    skirtDiameterMm: kit.skirt.diameterMm,
    skirtLengthMm: kit.skirt.lengthMm,
    minRadialClearanceMm: v.minRadialClearanceMm,
    minDepthClearanceMm: v.minDepthClearanceMm,
    minSealingLandMm: v.minSealingLandMm,
    studs: kit.walls.filter((w) => w.kind === "stud").map((w) => ({ label: w.label, plannedMm: w.minWallMm })),
  };
}

export type CheckKey = "cut-diameter" | "cut-depth" | "radial-clearance" | "depth-clearance" | "sealing-land" | "chips" | "trial-fit";

/** One line of plan against actual. `byMm` is how far outside the allowed band the actual is (0 when inside). */
export type VerificationCheck = {
  key: CheckKey;
  label: string;
  planned: string;
  actual: string;
  plannedMm: number | null;
  actualMm: number | null;
  state: "ok" | "fail" | "missing";
  byMm: number | null;
  message: string;
};

export type Verification = { verdict: "pass" | "fail" | "incomplete"; toleranceMm: number; checks: VerificationCheck[] };

const f = (n: number) => `${(Math.round(n * 1000) / 1000).toFixed(2)} mm`;
const round3 = (n: number) => Math.round(n * 1000) / 1000;
/** Rounds to 1 µm so float noise never turns "exactly at the limit" into a failure. */
const atLeast = (value: number, limit: number) => round3(value - limit) >= 0;

/**
 * Compares the after-cut readings with the plan. The worst reading counts each time: the smallest diameter
 * and the shallowest depth for clearance (the skirt meets the tightest spot), the largest diameter for
 * over-cutting (it eats the sealing land). Radial clearance = (smallest cut diameter − skirt diameter) / 2;
 * depth clearance = shallowest depth − (skirt length − gasket stack used), the skirt's protrusion below the
 * deck with that stack. Common practice, no published source.
 */
export function verifyCut(plan: VerificationPlan, r: AfterCutReadings, toleranceMm: number = DEFAULT_VERIFY_TOLERANCE_MM): Verification {
  const checks: VerificationCheck[] = [];
  const minD = Math.min(...r.cutDiameterMm);
  const maxD = Math.max(...r.cutDiameterMm);
  const minDepth = Math.min(...r.cutDepthMm);
  const maxDepth = Math.max(...r.cutDepthMm);

  // Diameter: every reading within ±tolerance of the planned diameter.
  {
    const under = plan.cutDiameterMm - toleranceMm - minD;
    const over = maxD - (plan.cutDiameterMm + toleranceMm);
    const by = round3(Math.max(under, over, 0));
    const actual = minD === maxD ? f(minD) : `${f(minD)} – ${f(maxD)}`;
    checks.push({
      key: "cut-diameter",
      label: "Cut diameter",
      planned: `${f(plan.cutDiameterMm)} ± ${f(toleranceMm)}`,
      actual,
      plannedMm: plan.cutDiameterMm,
      actualMm: round3(over > under ? maxD : minD),
      state: by > 0 ? "fail" : "ok",
      byMm: by,
      message: by <= 0 ? "Within tolerance." : over > under ? `Cut ${f(by)} larger than the plan allows.` : `Cut ${f(by)} smaller than the plan allows.`,
    });
  }
  // Depth: at or below the planned depth (deeper is fine only within tolerance when a step remains).
  {
    const under = plan.cutDepthMm - toleranceMm - minDepth;
    const over = plan.throughMouth ? 0 : maxDepth - (plan.cutDepthMm + toleranceMm);
    const by = round3(Math.max(under, over, 0));
    checks.push({
      key: "cut-depth",
      label: "Cut depth",
      planned: `${f(plan.cutDepthMm)} ± ${f(toleranceMm)}`,
      actual: minDepth === maxDepth ? f(minDepth) : `${f(minDepth)} – ${f(maxDepth)}`,
      plannedMm: plan.cutDepthMm,
      actualMm: round3(over > under ? maxDepth : minDepth),
      state: by > 0 ? "fail" : "ok",
      byMm: by,
      message: by <= 0 ? "Within tolerance." : over > under ? `Cut ${f(by)} deeper than the plan allows.` : `Cut ${f(by)} shallower than the plan allows.`,
    });
  }
  // Radial clearance with the skirt, from the smallest diameter read.
  {
    const clearance = round3((minD - plan.skirtDiameterMm) / 2);
    const ok = atLeast(clearance, plan.minRadialClearanceMm);
    checks.push({
      key: "radial-clearance",
      label: "Radial clearance to the skirt",
      planned: `≥ ${f(plan.minRadialClearanceMm)}`,
      actual: f(clearance),
      plannedMm: plan.minRadialClearanceMm,
      actualMm: clearance,
      state: ok ? "ok" : "fail",
      byMm: ok ? 0 : round3(plan.minRadialClearanceMm - clearance),
      message: ok ? "The skirt clears the cut." : clearance < 0 ? `The skirt interferes by ${f(-clearance)}.` : `Short of the minimum by ${f(plan.minRadialClearanceMm - clearance)}.`,
    });
  }
  // Depth clearance with the gasket stack actually used.
  if (plan.throughMouth) {
    checks.push({
      key: "depth-clearance",
      label: "Depth clearance under the skirt",
      planned: "no step (cut opens into the crank chamber)",
      actual: "no step",
      plannedMm: null,
      actualMm: null,
      state: "ok",
      byMm: 0,
      message: "The cut leaves no step for the skirt to bottom on.",
    });
  } else {
    const protrusion = plan.skirtLengthMm - r.gasketStackMm;
    const clearance = round3(minDepth - protrusion);
    const ok = atLeast(clearance, plan.minDepthClearanceMm);
    checks.push({
      key: "depth-clearance",
      label: `Depth clearance under the skirt (gasket stack ${f(r.gasketStackMm)})`,
      planned: `≥ ${f(plan.minDepthClearanceMm)}`,
      actual: f(clearance),
      plannedMm: plan.minDepthClearanceMm,
      actualMm: clearance,
      state: ok ? "ok" : "fail",
      byMm: ok ? 0 : round3(plan.minDepthClearanceMm - clearance),
      message: ok
        ? "The cylinder seals on the gasket before the skirt reaches the step."
        : clearance < 0
          ? `The skirt bottoms on the step ${f(-clearance)} before the base seals.`
          : `Short of the minimum by ${f(plan.minDepthClearanceMm - clearance)}.`,
    });
  }
  // Sealing land at each stud of the plan.
  for (const stud of plan.studs) {
    const found = r.sealingLandMm.find((s) => s.stud.trim().toLowerCase() === stud.label.toLowerCase());
    if (!found) {
      checks.push({
        key: "sealing-land",
        label: `Sealing land at ${stud.label}`,
        planned: `${f(stud.plannedMm)} (≥ ${f(plan.minSealingLandMm)})`,
        actual: "not measured",
        plannedMm: stud.plannedMm,
        actualMm: null,
        state: "missing",
        byMm: null,
        message: "Measure the land between the cut and this stud hole.",
      });
      continue;
    }
    const ok = atLeast(found.valueMm, plan.minSealingLandMm);
    checks.push({
      key: "sealing-land",
      label: `Sealing land at ${stud.label}`,
      planned: `${f(stud.plannedMm)} (≥ ${f(plan.minSealingLandMm)})`,
      actual: f(found.valueMm),
      plannedMm: stud.plannedMm,
      actualMm: round3(found.valueMm),
      state: ok ? "ok" : "fail",
      byMm: ok ? 0 : round3(plan.minSealingLandMm - found.valueMm),
      message: ok ? "Enough land for the base gasket." : `Below the minimum by ${f(plan.minSealingLandMm - found.valueMm)}; the base gasket may not seal.`,
    });
  }
  checks.push({
    key: "chips",
    label: "Crankcase cleaned of chips",
    planned: "yes",
    actual: r.chipsCleaned ? "yes" : "no",
    plannedMm: null,
    actualMm: null,
    state: r.chipsCleaned ? "ok" : "fail",
    byMm: null,
    message: r.chipsCleaned ? "Cleaned." : "Remove every chip from the crankcase before assembly.",
  });
  checks.push({
    key: "trial-fit",
    label: "Trial fit",
    planned: TRIAL_FIT_LABEL["goes-home"],
    actual: TRIAL_FIT_LABEL[r.trialFit],
    plannedMm: null,
    actualMm: null,
    state: r.trialFit === "goes-home" ? "ok" : r.trialFit === "not-tried" ? "missing" : "fail",
    byMm: null,
    message: r.trialFit === "goes-home" ? "The cylinder went fully home." : r.trialFit === "not-tried" ? "Trial-fit the cylinder before verifying." : "Find what binds before assembly.",
  });

  const verdict = checks.some((c) => c.state === "fail") ? "fail" : checks.some((c) => c.state === "missing") ? "incomplete" : "pass";
  return { verdict, toleranceMm, checks };
}
