// After-cut verification in words: each figure of the measured cut against the plan, as the job page, the API
// and the setup history show it. The arithmetic is the core's (geometry/verification.ts); this module only
// words it. Pure: no I/O and no server-only import, so the job page, the API and the tests share one comparison.
import { type AfterCutReadings, TRIAL_FIT_LABEL } from "@/model/schemas/jobs";
import { TERM } from "@/model/glossary";
import { lengthLabel } from "@/model/units";
import { type BandCheck, DEFAULT_VERIFY_TOLERANCE_MM, type MinimumCheck, type VerificationPlan, cutFigures } from "@/geometry";

export { DEFAULT_VERIFY_TOLERANCE_MM, VerificationPlanError, planFromResult, type VerificationPlan } from "@/geometry";
// The readings' shape is a request schema; it lives with the other job requests.
export { AfterCutReadingsSchema, TRIAL_FIT, TRIAL_FIT_LABEL, type AfterCutReadings, type TrialFit } from "@/model/schemas/jobs";

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

// The after-cut figures are compared and shown in mm, whatever units the shop reads by.
const f = (mm: number) => lengthLabel(mm, "mm");
const range = (b: BandCheck) => (b.minMm === b.maxMm ? f(b.minMm) : `${f(b.minMm)} – ${f(b.maxMm)}`);

function bandRow(key: "cut-diameter" | "cut-depth", b: BandCheck, toleranceMm: number): VerificationCheck {
  const [label, larger, smaller] = key === "cut-diameter" ? [TERM.cutDiameter.label, "larger", "smaller"] : [TERM.cutDepth.short, "deeper", "shallower"];
  return {
    key,
    label,
    planned: `${f(b.plannedMm)} ± ${f(toleranceMm)}`,
    actual: range(b),
    plannedMm: b.plannedMm,
    actualMm: b.actualMm,
    state: b.side ? "fail" : "ok",
    byMm: b.byMm,
    message: !b.side ? "Within tolerance." : `Cut ${f(b.byMm)} ${b.side === "over" ? larger : smaller} than the plan allows.`,
  };
}

function minimumRow(key: CheckKey, label: string, m: MinimumCheck, okText: string, negativeText: (byText: string) => string): VerificationCheck {
  return {
    key,
    label,
    planned: `≥ ${f(m.minMm)}`,
    actual: f(m.actualMm),
    plannedMm: m.minMm,
    actualMm: m.actualMm,
    state: m.ok ? "ok" : "fail",
    byMm: m.shortMm,
    message: m.ok ? okText : m.actualMm < 0 ? negativeText(f(-m.actualMm)) : `Short of the minimum by ${f(m.minMm - m.actualMm)}.`,
  };
}

/** Compares the after-cut readings with the plan, one worded check per figure, then chips and the trial fit. */
export function verifyCut(plan: VerificationPlan, r: AfterCutReadings, toleranceMm: number = DEFAULT_VERIFY_TOLERANCE_MM): Verification {
  const fig = cutFigures(plan, r, toleranceMm);
  const checks: VerificationCheck[] = [bandRow("cut-diameter", fig.diameter, toleranceMm), bandRow("cut-depth", fig.depth, toleranceMm)];
  checks.push(minimumRow("radial-clearance", TERM.clearanceToCut.label, fig.radial, "The skirt clears the cut.", (by) => `The skirt interferes by ${by}.`));
  if (fig.depthClearance === null) {
    checks.push({
      key: "depth-clearance",
      label: TERM.depthClearance.label,
      planned: "no step (cut opens into the crank chamber)",
      actual: "no step",
      plannedMm: null,
      actualMm: null,
      state: "ok",
      byMm: 0,
      message: "The cut leaves no step for the skirt to bottom on.",
    });
  } else {
    checks.push(
      minimumRow(
        "depth-clearance",
        `Depth clearance under the skirt (gasket stack ${f(r.gasketStackMm)})`,
        fig.depthClearance,
        "The cylinder seals on the gasket before the skirt reaches the step.",
        (by) => `The skirt bottoms on the step ${by} before the base seals.`,
      ),
    );
  }
  for (const land of fig.lands) {
    const planned = `${f(land.plannedMm)} (≥ ${f(plan.minSealingLandMm)})`;
    const m = land.measured;
    checks.push(
      m
        ? {
            key: "sealing-land",
            label: `Sealing land at ${land.label}`,
            planned,
            actual: f(m.actualMm),
            plannedMm: land.plannedMm,
            actualMm: m.actualMm,
            state: m.ok ? "ok" : "fail",
            byMm: m.shortMm,
            message: m.ok ? "Enough land for the base gasket." : `Below the minimum by ${f(m.shortMm)}; the base gasket may not seal.`,
          }
        : {
            key: "sealing-land",
            label: `Sealing land at ${land.label}`,
            planned,
            actual: "not measured",
            plannedMm: land.plannedMm,
            actualMm: null,
            state: "missing",
            byMm: null,
            message: "Measure the land between the cut and this stud hole.",
          },
    );
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
