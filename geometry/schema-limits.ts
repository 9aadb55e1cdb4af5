import { z } from "zod";
import { DEFAULT_LIMITS } from "./limits";

// The limits a fit is judged by: the shop's (every field filled from its default) and a study's own (any subset).

const limitFields = {
  minRadialClearanceMm: z.number().nonnegative().max(100),
  minDepthClearanceMm: z.number().nonnegative().max(100),
  minSealingLandMm: z.number().nonnegative().max(100),
  minWallMm: z.number().nonnegative().max(100),
  studToleranceMm: z.number().nonnegative().max(100),
  hardwareMarginMm: z.number().nonnegative().max(100),
  maxRockMm: z.number().nonnegative().max(100),
  minCrankClearanceMm: z.number().nonnegative().max(100),
  cuttingSpeedMinMPerMin: z.number().positive().max(5000),
  cuttingSpeedMaxMPerMin: z.number().positive().max(5000),
  displacementClassesCc: z.array(z.number().positive().max(100_000)).max(10),
};

const speedOrder = (l: { cuttingSpeedMinMPerMin?: number; cuttingSpeedMaxMPerMin?: number }) =>
  l.cuttingSpeedMinMPerMin === undefined || l.cuttingSpeedMaxMPerMin === undefined || l.cuttingSpeedMinMPerMin <= l.cuttingSpeedMaxMPerMin;
const speedOrderIssue = { message: "the lowest cutting speed must not exceed the highest", path: ["cuttingSpeedMaxMPerMin"] };

/** The shop's limits with every missing field filled from its named default (for shop settings and forms). */
export const LimitsSchema = z
  .strictObject({
    minRadialClearanceMm: limitFields.minRadialClearanceMm.default(DEFAULT_LIMITS.minRadialClearanceMm),
    minDepthClearanceMm: limitFields.minDepthClearanceMm.default(DEFAULT_LIMITS.minDepthClearanceMm),
    minSealingLandMm: limitFields.minSealingLandMm.default(DEFAULT_LIMITS.minSealingLandMm),
    minWallMm: limitFields.minWallMm.default(DEFAULT_LIMITS.minWallMm),
    studToleranceMm: limitFields.studToleranceMm.default(DEFAULT_LIMITS.studToleranceMm),
    hardwareMarginMm: limitFields.hardwareMarginMm.default(DEFAULT_LIMITS.hardwareMarginMm),
    maxRockMm: limitFields.maxRockMm.default(DEFAULT_LIMITS.maxRockMm),
    minCrankClearanceMm: limitFields.minCrankClearanceMm.default(DEFAULT_LIMITS.minCrankClearanceMm),
    cuttingSpeedMinMPerMin: limitFields.cuttingSpeedMinMPerMin.default(DEFAULT_LIMITS.cuttingSpeedMinMPerMin),
    cuttingSpeedMaxMPerMin: limitFields.cuttingSpeedMaxMPerMin.default(DEFAULT_LIMITS.cuttingSpeedMaxMPerMin),
    displacementClassesCc: limitFields.displacementClassesCc.default([...DEFAULT_LIMITS.displacementClassesCc]),
  })
  .refine(speedOrder, speedOrderIssue);

/**
 * The limits as a study gives them: any subset, with no defaults filled in, so the result can say which
 * limits were defaults (evaluateStudy fills the rest from DEFAULT_LIMITS and lists them as defaulted).
 */
export const StudyLimitsSchema = z
  .strictObject({
    minRadialClearanceMm: limitFields.minRadialClearanceMm.optional(),
    minDepthClearanceMm: limitFields.minDepthClearanceMm.optional(),
    minSealingLandMm: limitFields.minSealingLandMm.optional(),
    minWallMm: limitFields.minWallMm.optional(),
    studToleranceMm: limitFields.studToleranceMm.optional(),
    hardwareMarginMm: limitFields.hardwareMarginMm.optional(),
    maxRockMm: limitFields.maxRockMm.optional(),
    minCrankClearanceMm: limitFields.minCrankClearanceMm.optional(),
    cuttingSpeedMinMPerMin: limitFields.cuttingSpeedMinMPerMin.optional(),
    cuttingSpeedMaxMPerMin: limitFields.cuttingSpeedMaxMPerMin.optional(),
    displacementClassesCc: limitFields.displacementClassesCc.optional(),
  })
  .refine(speedOrder, speedOrderIssue);

export type Limits = z.infer<typeof LimitsSchema>;
export type StudyLimits = z.infer<typeof StudyLimitsSchema>;
