import { z } from "zod";
import { label, lengthMm, nonNegativeMm } from "./schema-fields";
import { ThreadDesignationSchema, Vec2Schema } from "./schema-outline";

// The boring rig, the cut planned with it and the holder readings taken before the cut.

export const BitCalibrationSchema = z
  .strictObject({
    bitLengthMm: lengthMm(),
    minCutDiameterMm: lengthMm(),
    maxCutDiameterMm: lengthMm(),
  })
  .refine((c) => c.minCutDiameterMm < c.maxCutDiameterMm, {
    message: "the smallest cut must be below the largest",
    path: ["maxCutDiameterMm"],
  });

// A rig's stock as a shop has it. These also bound the depth-stop search: Π(count + 1) over half the sizes
// is at most 21³ stacks (see depthStopWorkBound), whatever the thicknesses.
/** Most stop grooves on one shaft. */
export const MAX_GROOVES = 12;
/** Most shim sizes in a rig's stock. */
export const MAX_SHIM_SIZES = 6;
/** Most shims of one size. */
export const MAX_SHIMS_PER_SIZE = 20;
/** Thickest shim or spacer, mm. */
export const MAX_SHIM_THICKNESS_MM = 25;
/** Longest stop travel, mm. */
export const MAX_GROOVE_TRAVEL_MM = 1000;

export const BoringRigSchema = z.strictObject({
  name: label(),
  /** Cutter head diameter as measured, without the bit. */
  headDiameterMm: lengthMm(),
  /** Length of the bit installed now. */
  bitLengthMm: lengthMm(),
  calibration: BitCalibrationSchema,
  /** Radius from the shaft axis of the outermost rotating hardware (screw heads). */
  hardwareRadiusMm: lengthMm().optional(),
  grooves: z
    .array(z.strictObject({ label: label(), travelMm: lengthMm().max(MAX_GROOVE_TRAVEL_MM, `a stop travel is at most ${MAX_GROOVE_TRAVEL_MM} mm`) }))
    .min(1, "at least one stop groove")
    .max(MAX_GROOVES, `at most ${MAX_GROOVES} stop grooves`),
  shims: z
    .array(
      z.strictObject({
        thicknessMm: lengthMm().max(MAX_SHIM_THICKNESS_MM, `a shim is at most ${MAX_SHIM_THICKNESS_MM} mm thick`),
        count: z.number().int().min(1).max(MAX_SHIMS_PER_SIZE, `at most ${MAX_SHIMS_PER_SIZE} shims of one size`),
      }),
    )
    .max(MAX_SHIM_SIZES, `at most ${MAX_SHIM_SIZES} shim sizes`)
    .default([]),
  drillTopRpm: z.number().positive().max(100_000),
  /** Resolution to which the cutter setting can be read and set. */
  settingResolutionMm: lengthMm().optional(),
  studThread: ThreadDesignationSchema.optional(),
});

export const CutPlanSchema = z.strictObject({
  diameterMm: lengthMm().optional(),
  depthMm: lengthMm().optional(),
  /** Centring offset: where the rig's axis sits relative to the case stud-pattern centre at the deck. */
  centerOffsetMm: Vec2Schema.optional(),
});

export const HolderReadingSchema = z.strictObject({
  /** Label of the case stud the reading was taken at. */
  stud: label(),
  heightMm: nonNegativeMm(),
  /** Thickness of a straightedge laid on the deck under the gauge, added to the reading. */
  straightedgeMm: nonNegativeMm().default(0),
});

export const ReadingsSchema = z.strictObject({
  holderHeights: z.array(HolderReadingSchema).max(16),
});

export type BoringRig = z.infer<typeof BoringRigSchema>;
export type CutPlan = z.infer<typeof CutPlanSchema>;
export type Readings = z.infer<typeof ReadingsSchema>;
