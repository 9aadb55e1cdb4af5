import { DEFAULT_LIMITS, type LimitName } from "./limits";
import type { StudyLimits } from "./schema";

/** The limits in force: every field, and the names of those taken from their defaults. */
export interface ResolvedLimits {
  readonly values: { -readonly [K in LimitName]: K extends "displacementClassesCc" ? number[] : number };
  readonly defaulted: LimitName[];
}

/** Fills the limits a study does not give from DEFAULT_LIMITS and lists which ones were defaulted. */
export function resolveLimits(given: StudyLimits | undefined): ResolvedLimits {
  const defaulted: LimitName[] = [];
  const pick = <K extends LimitName>(k: K) => {
    const v = given?.[k];
    if (v === undefined) defaulted.push(k);
    return v;
  };
  const values = {
    minRadialClearanceMm: pick("minRadialClearanceMm") ?? DEFAULT_LIMITS.minRadialClearanceMm,
    minDepthClearanceMm: pick("minDepthClearanceMm") ?? DEFAULT_LIMITS.minDepthClearanceMm,
    minSealingLandMm: pick("minSealingLandMm") ?? DEFAULT_LIMITS.minSealingLandMm,
    minWallMm: pick("minWallMm") ?? DEFAULT_LIMITS.minWallMm,
    studToleranceMm: pick("studToleranceMm") ?? DEFAULT_LIMITS.studToleranceMm,
    hardwareMarginMm: pick("hardwareMarginMm") ?? DEFAULT_LIMITS.hardwareMarginMm,
    maxRockMm: pick("maxRockMm") ?? DEFAULT_LIMITS.maxRockMm,
    minCrankClearanceMm: pick("minCrankClearanceMm") ?? DEFAULT_LIMITS.minCrankClearanceMm,
    cuttingSpeedMinMPerMin: pick("cuttingSpeedMinMPerMin") ?? DEFAULT_LIMITS.cuttingSpeedMinMPerMin,
    cuttingSpeedMaxMPerMin: pick("cuttingSpeedMaxMPerMin") ?? DEFAULT_LIMITS.cuttingSpeedMaxMPerMin,
    displacementClassesCc: [...(pick("displacementClassesCc") ?? DEFAULT_LIMITS.displacementClassesCc)],
  };
  return { values, defaulted };
}
