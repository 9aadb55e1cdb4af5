// The shop's limits. Every default here is shown to the user as a default and can be changed.

/** Minimum radial clearance between skirt and cut, mm. Common practice, no published source. */
export const DEFAULT_MIN_RADIAL_CLEARANCE_MM = 0.5;

/**
 * Minimum depth clearance between skirt bottom and counterbore step, mm. Common practice, no published
 * source (a builder judged 0.3 mm too tight and accepted about 0.8 mm).
 */
export const DEFAULT_MIN_DEPTH_CLEARANCE_MM = 0.5;

/** Minimum sealing land between the cut and a stud hole, mm. Common practice, no published source. */
export const DEFAULT_MIN_SEALING_LAND_MM = 2;

/** Minimum wall between the cut and a pocket or the outside of the deck, mm. Common practice, no published source. */
export const DEFAULT_MIN_WALL_MM = 2;

/** Largest offset between a kit stud and the case stud it goes on, mm. Common practice, no published source. */
export const DEFAULT_STUD_TOLERANCE_MM = 0.3;

/** Margin by which rotating hardware must stay inside the cut radius, mm. Common practice, no published source. */
export const DEFAULT_HARDWARE_MARGIN_MM = 1;

/**
 * Cutting-speed range for aluminium alloy with a carbide bit, m/min. Lies inside Carvill, Mechanical
 * Engineer's Data Handbook §5.6.7 (90–150 m/min rough) and Kyocera turning data (100–200 m/min).
 */
export const DEFAULT_CUTTING_SPEED_MIN_M_PER_MIN = 100;
export const DEFAULT_CUTTING_SPEED_MAX_M_PER_MIN = 150;

/** Legal-class displacement thresholds, cc. 50 cc is a common moped limit; the rules are local. */
export const DEFAULT_DISPLACEMENT_CLASSES_CC: readonly number[] = [50];

/** Holder rocking above which the readings are reported as untrustworthy, mm. Common practice, no published source. */
export const DEFAULT_MAX_ROCK_MM = 0.05;

/**
 * Least clearance between the skirt's lower edge and the swept crank webs (flywheel), mm. Common practice, no
 * published source.
 */
export const DEFAULT_MIN_CRANK_CLEARANCE_MM = 1;

/** All limit defaults by field name. */
export const DEFAULT_LIMITS = {
  minRadialClearanceMm: DEFAULT_MIN_RADIAL_CLEARANCE_MM,
  minDepthClearanceMm: DEFAULT_MIN_DEPTH_CLEARANCE_MM,
  minSealingLandMm: DEFAULT_MIN_SEALING_LAND_MM,
  minWallMm: DEFAULT_MIN_WALL_MM,
  studToleranceMm: DEFAULT_STUD_TOLERANCE_MM,
  hardwareMarginMm: DEFAULT_HARDWARE_MARGIN_MM,
  maxRockMm: DEFAULT_MAX_ROCK_MM,
  minCrankClearanceMm: DEFAULT_MIN_CRANK_CLEARANCE_MM,
  cuttingSpeedMinMPerMin: DEFAULT_CUTTING_SPEED_MIN_M_PER_MIN,
  cuttingSpeedMaxMPerMin: DEFAULT_CUTTING_SPEED_MAX_M_PER_MIN,
  displacementClassesCc: DEFAULT_DISPLACEMENT_CLASSES_CC,
} as const;

export type LimitName = keyof typeof DEFAULT_LIMITS;

/** Density of the case alloy when the study gives none: A356.0-T6, 2.67 g/cm³ (MatWeb). */
export const DEFAULT_CASE_DENSITY_G_PER_CM3 = 2.67;

/** Cutter-setting resolution when the rig gives none, mm (a caliper read to 0.05). Common practice, no published source. */
export const DEFAULT_SETTING_RESOLUTION_MM = 0.05;

/** Diameter resolution of a proposed cut when there is no rig, mm. Common practice, no published source. */
export const DEFAULT_DIAMETER_RESOLUTION_MM = 0.1;

/** Resolution of a proposed cut depth, mm. Common practice, no published source. */
export const DEFAULT_DEPTH_RESOLUTION_MM = 0.05;
