import { skirtClearance } from "./clearance";
import { skirtProtrusionMm } from "./depth";
import { GeometryError } from "./errors";
import type { KitResult, StudyResult } from "./result-schema";
import { ORIGIN } from "./vec";

// After-cut verification: what was actually cut against the plan the core gave for the chosen kit. The worst
// reading counts each time: the smallest diameter and the shallowest depth for clearance (the skirt meets the
// tightest spot), the largest diameter and depth for over-cutting. Common practice, no published source.

/**
 * How far a measured cut may sit from the planned one, mm. Common practice, no published source (a cut
 * set with a caliper read to 0.05 mm and measured the same way cannot be judged finer than that).
 */
export const DEFAULT_VERIFY_TOLERANCE_MM = 0.05;

/** The planned figures the readings are compared with, taken from the core's result for one kit. */
export interface VerificationPlan {
  readonly kitName: string;
  readonly cutDiameterMm: number;
  readonly cutDepthMm: number;
  /** The cut opens into the crank chamber, so no step remains and depth clearance does not apply. */
  readonly throughMouth: boolean;
  readonly skirtDiameterMm: number;
  readonly skirtLengthMm: number;
  readonly minRadialClearanceMm: number;
  readonly minDepthClearanceMm: number;
  readonly minSealingLandMm: number;
  /** The sealing land the plan leaves at each stud. */
  readonly studs: readonly { readonly label: string; readonly plannedMm: number }[];
}

/** What was measured after the cut, as far as the arithmetic needs it. */
export interface MeasuredCut {
  readonly cutDiameterMm: readonly number[];
  readonly cutDepthMm: readonly number[];
  readonly sealingLandMm: readonly { readonly stud: string; readonly valueMm: number }[];
  /** The base-gasket stack actually fitted. */
  readonly gasketStackMm: number;
}

/** A study result with no cut to verify for the chosen kit, or no such kit. */
export class VerificationPlanError extends GeometryError {
  constructor(message: string) {
    super("invalid-argument", message);
    this.name = "VerificationPlanError";
  }
}

/** The verification plan for one kit of a study result; throws VerificationPlanError when the kit is missing or has no cut. */
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

/** Rounds to 1 µm, so float noise never turns "exactly at the limit" into a failure. */
export function toMicron(n: number): number {
  return Math.round(n * 1000) / 1000;
}

/** True when value ≥ limit once both are taken to the micrometre. */
export function atLeastToMicron(value: number, limit: number): boolean {
  return toMicron(value - limit) >= 0;
}

/** Readings against a planned figure ± tolerance: how far the worst reading sits outside the band (0 inside), and on which side. */
export interface BandCheck {
  readonly plannedMm: number;
  readonly minMm: number;
  readonly maxMm: number;
  /** The reading that decides it: the largest when it lies further out over the band than the smallest lies under it. */
  readonly actualMm: number;
  readonly byMm: number;
  readonly side: "under" | "over" | null;
}

/** Band check: under = planned − tol − min, over = max − (planned + tol) (0 when over-cutting is allowed), by = max(under, over, 0) to the micrometre. */
export function bandCheck(plannedMm: number, readingsMm: readonly number[], toleranceMm: number, overAllowed = false): BandCheck {
  const minMm = Math.min(...readingsMm);
  const maxMm = Math.max(...readingsMm);
  const under = plannedMm - toleranceMm - minMm;
  const over = overAllowed ? 0 : maxMm - (plannedMm + toleranceMm);
  const byMm = toMicron(Math.max(under, over, 0));
  return { plannedMm, minMm, maxMm, actualMm: toMicron(over > under ? maxMm : minMm), byMm, side: byMm <= 0 ? null : over > under ? "over" : "under" };
}

/** A measured figure against the shop's minimum, to the micrometre. */
export interface MinimumCheck {
  readonly actualMm: number;
  readonly minMm: number;
  readonly ok: boolean;
  /** How far short of the minimum (0 when ok). */
  readonly shortMm: number;
}

function minimumCheck(actualMm: number, minMm: number): MinimumCheck {
  const ok = atLeastToMicron(actualMm, minMm);
  return { actualMm: toMicron(actualMm), minMm, ok, shortMm: ok ? 0 : toMicron(minMm - actualMm) };
}

/** Radial clearance of the skirt in the cut as measured: the core's skirt clearance in a round opening of the smallest diameter read, (D_min − d_skirt)/2. */
export function measuredRadialClearance(plan: VerificationPlan, cut: MeasuredCut): MinimumCheck {
  const opening = { kind: "circle" as const, diameterMm: Math.min(...cut.cutDiameterMm) };
  const clearanceMm = skirtClearance(ORIGIN, plan.skirtDiameterMm / 2, opening, 0).clearanceMm;
  return minimumCheck(clearanceMm, plan.minRadialClearanceMm);
}

/** Depth clearance with the gasket stack fitted: shallowest depth read − the skirt's protrusion with that stack (the core's skirt protrusion); null when the cut leaves no step. */
export function measuredDepthClearance(plan: VerificationPlan, cut: MeasuredCut): MinimumCheck | null {
  if (plan.throughMouth) return null;
  const { protrusionMm } = skirtProtrusionMm({ skirtLengthReadingsMm: [plan.skirtLengthMm], baseGasketsMm: [cut.gasketStackMm], alwaysWithGasket: true });
  return minimumCheck(Math.min(...cut.cutDepthMm) - protrusionMm, plan.minDepthClearanceMm);
}

/** The sealing land measured at one stud of the plan, or null when it was not measured. */
export interface LandCheck {
  readonly label: string;
  readonly plannedMm: number;
  readonly measured: MinimumCheck | null;
}

/** The measured sealing land at each stud of the plan against the minimum (stud labels matched ignoring case and surrounding spaces). */
export function measuredLands(plan: VerificationPlan, cut: MeasuredCut): LandCheck[] {
  return plan.studs.map((stud) => {
    const found = cut.sealingLandMm.find((s) => s.stud.trim().toLowerCase() === stud.label.toLowerCase());
    return { label: stud.label, plannedMm: stud.plannedMm, measured: found ? minimumCheck(found.valueMm, plan.minSealingLandMm) : null };
  });
}

/** Every measured figure of a cut against its plan: diameter and depth bands, radial and depth clearance, sealing lands. */
export interface CutFigures {
  readonly diameter: BandCheck;
  readonly depth: BandCheck;
  readonly radial: MinimumCheck;
  readonly depthClearance: MinimumCheck | null;
  readonly lands: readonly LandCheck[];
}

/** The figures of a measured cut against its plan (a cut through the mouth may run deeper than planned). */
export function cutFigures(plan: VerificationPlan, cut: MeasuredCut, toleranceMm: number = DEFAULT_VERIFY_TOLERANCE_MM): CutFigures {
  return {
    diameter: bandCheck(plan.cutDiameterMm, cut.cutDiameterMm, toleranceMm),
    depth: bandCheck(plan.cutDepthMm, cut.cutDepthMm, toleranceMm, plan.throughMouth),
    radial: measuredRadialClearance(plan, cut),
    depthClearance: measuredDepthClearance(plan, cut),
    lands: measuredLands(plan, cut),
  };
}
