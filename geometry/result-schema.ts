import { z } from "zod";

// Output schemas of the core. Every length is in millimetres and says so in its name; a field whose
// name ends in Mm and holds an object or array holds lengths in mm throughout (e.g. bitLengthWindowMm).

// zod 4 numbers reject NaN and ±Infinity, so every number in a valid result is finite.
const num = () => z.number();
const Vec2Out = z.tuple([num(), num()]).readonly();

export const VerdictSchema = z.enum(["fits-as-is", "fits-after-cut", "cannot-fit"]);

export const ReasonCodeSchema = z.enum([
  "clears-existing-mouth",
  "skirt-does-not-enter",
  "needs-cut",
  "stud-pattern-mismatch",
  "skirt-interferes-with-cut",
  "radial-clearance-below-minimum",
  "depth-clearance-below-minimum",
  "sealing-land-below-minimum",
  "wall-below-minimum",
  "cut-breaks-into-stud-hole",
  "cut-breaks-into-pocket",
  "cut-breaks-through-deck",
  "cut-larger-than-case-allows",
  "crank-clearance-below-minimum",
]);

export const WarningCodeSchema = z.enum([
  "stud-pattern-mismatch",
  "bit-cannot-reach",
  "hardware-strikes",
  "thread-mismatch",
  "kit-thread-differs",
  "tilt-eats-clearance",
  "depth-stop-unreachable",
  "radial-clearance-below-minimum",
  "depth-clearance-below-minimum",
  "wall-below-minimum",
  "sealing-land-below-minimum",
  "cut-breaks-into-pocket",
  "cut-breaks-into-stud-hole",
  "cut-breaks-through-deck",
  "cut-through-mouth",
  "cut-not-needed",
  "displacement-crosses-class",
  "drill-too-slow",
  "holder-rocks",
  "readings-insufficient",
  "crank-chamber-not-checked",
  "crank-clearance-below-minimum",
  "matched-passage-wall-below-minimum",
]);

export const WarningSchema = z.object({ code: WarningCodeSchema, message: z.string() });

export const InterferenceSchema = z.object({
  areaMm2: num(),
  deepestMm: num(),
  atMm: Vec2Out,
  angleDeg: num(),
});

export const WallResultSchema = z.object({
  kind: z.enum(["stud", "pocket", "outline"]),
  label: z.string(),
  minWallMm: num(),
  requiredMm: num(),
  /** False for a pocket that starts below the cut, so the cut cannot reach it. */
  reached: z.boolean(),
  ok: z.boolean(),
  atMm: Vec2Out,
  cutPointMm: Vec2Out,
});

export const RangeSchema = z.object({ min: num(), max: num() });

export const DepthStopResultSchema = z.object({
  wantedMm: num(),
  groove: z.string(),
  shims: z.array(z.object({ thicknessMm: num(), count: z.number().int() })),
  shimStackMm: num(),
  travelMm: num(),
  overshootMm: num(),
  shimCount: z.number().int(),
  reached: z.boolean(),
});

export const RigResultSchema = z.object({
  cutterSettingMm: num(),
  /** The setting to dial in: the exact one rounded up to the rig's resolution, so the cut never comes out smaller. */
  cutterSettingToSetMm: num().optional(),
  /** The cut diameter that setting gives: 2·setting − head diameter. */
  cutAtSettingMm: num().optional(),
  settingResolutionMm: num(),
  bitLengthMm: num(),
  bitReachMm: RangeSchema,
  bitReaches: z.boolean(),
  bitLengthWindowMm: RangeSchema,
  grindOffMm: num(),
  bitTooShortByMm: num(),
  /** Cut radius − hardware radius; null when the rig gives no hardware radius. */
  hardwareClearanceMm: num().nullable(),
  hardwareClears: z.boolean().nullable(),
  depthStop: DepthStopResultSchema,
  spindleRpm: z.object({ min: num(), max: num(), drillTopRpm: num(), drillLimited: z.boolean(), drillTooSlow: z.boolean() }),
});

export const CutResultSchema = z.object({
  diameterMm: num(),
  depthMm: num(),
  /** True when any part of the cut (diameter or depth) was proposed rather than given. */
  proposed: z.boolean(),
  diameterProposed: z.boolean(),
  depthProposed: z.boolean(),
  /** The cut's centre at the deck as planned (stud-pattern centre + centring offset). */
  centerMm: Vec2Out,
  /** The cut's centre at the deck and at its bottom as the tilted rig actually cuts it. */
  centerAtDeckMm: Vec2Out,
  centerAtBottomMm: Vec2Out,
  /** Depth of the shallowest point of the (tilted) bottom. */
  shallowestDepthMm: num(),
  /** True when the cut reaches the mouth's depth and opens into the crank chamber: no step remains. */
  throughMouth: z.boolean(),
});

export const LeastCutSchema = z.object({ diameterMm: num(), depthMm: num() });

export const KitAlignmentSchema = z.object({
  tiltDeg: num(),
  directionDeg: num(),
  rockMm: num(),
  /** Shift of the tool axis at the cut's bottom: |(h₀ + depth)·(a, b)|. */
  lateralShiftMm: num(),
  /** Height difference across the cut's bottom: D·tanθ. */
  depthVariationMm: num(),
  /** Largest axis offset from the skirt centre over the skirt's protrusion (tilt plus centring offset). */
  worstAxisOffsetMm: num(),
});

export const CrankResultSchema = z.object({
  /** False when the case profile gives no crank chamber, so the skirt's clearance to the webs was not checked. */
  checked: z.boolean(),
  /** Least distance from the skirt's lower edge to the swept crank webs; negative when they reach into it. Null when not checked. */
  clearanceMm: num().nullable(),
  requiredMm: num(),
  ok: z.boolean().nullable(),
  /** The nearest point of the skirt's lower edge in the deck plane (crank axis along x; its mirror images are as near). */
  atMm: Vec2Out.nullable(),
  /** Depth of the skirt's lower edge below the deck (its protrusion). */
  edgeDepthMm: num().nullable(),
});

export const PortResultSchema = z.object({
  portLabel: z.string(),
  /** The case passage under the port window, or null when it sits over none. */
  pocketLabel: z.string().nullable(),
  /** The port's area centroid, where the two section lines of the steps cross. */
  centroidMm: Vec2Out,
  /** Direction of the radial section line from the bore axis through the centroid, degrees counter-clockwise from +x. */
  directionDeg: num(),
  /** Step at each edge (positive where the passage is narrower than the port); null where the section line misses the passage. */
  steps: z.object({ innerMm: num().nullable(), outerMm: num().nullable(), ccwMm: num().nullable(), cwMm: num().nullable() }),
  /** Wall between the planned cut and the passage opened to match the port (their union); null without a cut. */
  matchedWallMm: num().nullable(),
  requiredMm: num(),
  ok: z.boolean().nullable(),
});

export const KitResultSchema = z.object({
  kitId: z.string(),
  name: z.string(),
  verdict: VerdictSchema,
  reasons: z.array(ReasonCodeSchema),
  skirt: z.object({
    centerMm: Vec2Out,
    /** The worst (largest) diameter reading, the one every clearance uses. */
    diameterMm: num(),
    /** The longest length reading. */
    lengthMm: num(),
    /** Gasket thickness subtracted (0 unless the kit is always run with a gasket). */
    gasketMm: num(),
    protrusionMm: num(),
  }),
  cut: CutResultSchema.nullable(),
  /**
   * The least cut that clears this kit, whatever cut is planned: D = 2·(r + c_min + worst axis offset) rounded up so
   * the cutter setting lands on the rig's resolution (0.1 mm of diameter without a rig), depth = protrusion + c_min
   * + bottom tilt variation rounded up to 0.05 mm; null when the skirt already clears the mouth.
   */
  leastCut: LeastCutSchema.nullable(),
  radialClearanceMm: z.object({
    /** Against the existing mouth, at the deck. */
    vsMouth: num(),
    /** Against the cut as planned (no tilt); null when there is no cut. */
    vsCut: num().nullable(),
  }),
  /** Against the cut as the tilted rig cuts it: R − r − worst axis offset over the protrusion; null without a cut. */
  effectiveRadialClearanceMm: num().nullable(),
  /** Shallowest bottom point − protrusion; null without a cut or when the cut leaves no step. */
  depthClearanceMm: num().nullable(),
  interference: z.object({ vsMouth: InterferenceSchema.nullable(), vsCut: InterferenceSchema.nullable() }),
  walls: z.array(WallResultSchema),
  thinnestWall: WallResultSchema.nullable(),
  /** Largest cut diameter keeping every required wall, at this cut's centre and depth. */
  maxCutDiameterMm: num(),
  studMatch: z.object({
    ok: z.boolean(),
    worstOffsetMm: num(),
    studs: z.array(z.object({ kitStud: z.string(), caseStud: z.string(), offsetMm: num(), ok: z.boolean() })),
    sharedCaseStuds: z.array(z.string()),
    thread: z.object({ kit: z.string(), case: z.string(), ok: z.boolean() }).nullable(),
  }),
  rig: RigResultSchema.nullable(),
  alignment: KitAlignmentSchema.nullable(),
  crank: CrankResultSchema,
  /** One entry per port window of the kit's base gasket (empty when the kit gives none). */
  ports: z.array(PortResultSchema),
  displacementCc: z.object({
    stock: num(),
    kit: num(),
    change: num(),
    /** Rounded to the nearest whole cc (as in US 40 CFR 86.419-78). */
    stockRounded: z.number().int(),
    kitRounded: z.number().int(),
    crossesClasses: z.array(num()),
  }),
  removal: z.object({ areaMm2: num(), volumeMm3: num(), massG: num(), densityGPerCm3: num(), densityDefaulted: z.boolean() }),
  warnings: z.array(WarningSchema),
});

export const StudyAlignmentSchema = z.object({
  a: num(),
  b: num(),
  cMm: num(),
  tiltDeg: num(),
  directionDeg: num(),
  rockMm: num(),
  residuals: z.array(z.object({ stud: z.string(), residualMm: num() })),
});

export const StudyResultSchema = z.object({
  kits: z.array(KitResultSchema),
  case: z.object({
    studPatternCenterMm: Vec2Out,
    mouthDepthMm: num(),
    /** Largest cut diameter at the deck centre through the mouth's full depth. */
    maxCutDiameterMm: num(),
    stockDisplacementCc: num(),
    rigThread: z.object({ rig: z.string(), case: z.string(), ok: z.boolean() }).nullable(),
    /** False when the case profile gives no crank chamber (every kit's crank.checked is then false). */
    crankChecked: z.boolean(),
  }),
  alignment: StudyAlignmentSchema.nullable(),
  limits: z.object({
    values: z.object({
      minRadialClearanceMm: num(),
      minDepthClearanceMm: num(),
      minSealingLandMm: num(),
      minWallMm: num(),
      studToleranceMm: num(),
      hardwareMarginMm: num(),
      maxRockMm: num(),
      minCrankClearanceMm: num(),
      cuttingSpeedMinMPerMin: num(),
      cuttingSpeedMaxMPerMin: num(),
      displacementClassesCc: z.array(num()),
    }),
    /** Names of the limits that took their default value (show these as defaults). */
    defaulted: z.array(z.string()),
  }),
  toleranceMm: num(),
  warnings: z.array(WarningSchema),
});

export type Verdict = z.infer<typeof VerdictSchema>;
export type ReasonCode = z.infer<typeof ReasonCodeSchema>;
export type WarningCode = z.infer<typeof WarningCodeSchema>;
export type Warning = z.infer<typeof WarningSchema>;
export type KitResult = z.infer<typeof KitResultSchema>;
export type StudyResult = z.infer<typeof StudyResultSchema>;
export type RigResult = z.infer<typeof RigResultSchema>;
export type CutResult = z.infer<typeof CutResultSchema>;
export type WallResult = z.infer<typeof WallResultSchema>;
export type LeastCut = z.infer<typeof LeastCutSchema>;
export type CrankResult = z.infer<typeof CrankResultSchema>;
export type PortResult = z.infer<typeof PortResultSchema>;
