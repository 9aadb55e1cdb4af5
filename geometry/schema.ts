import { z } from "zod";
import {
  DEFAULT_LIMITS,
} from "./limits";
import { describePolygonProblem, polygonProblem } from "./simplicity";
import { CaptureSchema } from "./shapes";

// Input schemas of the core. Every length is in millimetres and says so in its name.

const MAX_LENGTH_MM = 10_000;

const lengthMm = () => z.number().positive().max(MAX_LENGTH_MM);
const nonNegativeMm = () => z.number().nonnegative().max(MAX_LENGTH_MM);
const coordinateMm = () => z.number().min(-MAX_LENGTH_MM).max(MAX_LENGTH_MM);
const label = () => z.string().trim().min(1).max(80);

/** A point in the deck plane, [x, y] in mm, origin on the cylinder axis at the deck. */
export const Vec2Schema = z.tuple([coordinateMm(), coordinateMm()]).readonly();

/** ISO metric thread designation: "M8" (coarse pitch implied) or "M8x1.25". */
export const ThreadDesignationSchema = z
  .string()
  .trim()
  .regex(/^M\d+(\.\d+)?(\s*[x×]\s*\d+(\.\d+)?)?$/i, "expected an ISO metric thread such as M8 or M8x1.25");

export const CircleOutlineSchema = z.strictObject({
  kind: z.literal("circle"),
  diameterMm: lengthMm(),
  centerMm: Vec2Schema.optional(),
});

// Corners an outline may have: a traced or imported outline needs a few hundred. The totals bound the cost of a
// study: validation is O(n log n) per outline (polygonProblem) and evaluation O(n) per outline and kit.
/** Most corners of one polygon outline. */
export const MAX_OUTLINE_CORNERS = 2000;
/** Most corners of a case's outlines together (deck, mouth and pockets). */
export const MAX_CASE_CORNERS = 6000;
/** Most corners of a study's outlines together (the case's and every kit's). */
export const MAX_STUDY_CORNERS = 20_000;

/** Number of corners of an outline (a circle has none). */
export function outlineCorners(outline: { kind: string; pointsMm?: readonly unknown[] } | undefined): number {
  return outline?.kind === "polygon" ? (outline.pointsMm?.length ?? 0) : 0;
}

export const PolygonOutlineSchema = z
  .strictObject({
    kind: z.literal("polygon"),
    pointsMm: z
      .array(Vec2Schema)
      .min(3, "a polygon needs at least 3 points")
      .max(MAX_OUTLINE_CORNERS, `a polygon has at most ${MAX_OUTLINE_CORNERS} corners`),
  })
  .superRefine((poly, ctx) => {
    const problem = polygonProblem(poly.pointsMm);
    if (problem) ctx.addIssue({ code: "custom", path: ["pointsMm"], message: describePolygonProblem(problem, poly.pointsMm.length) });
  });

/** A closed outline in the deck plane: a circle (analytic) or a simple polygon. */
export const OutlineSchema = z.discriminatedUnion("kind", [CircleOutlineSchema, PolygonOutlineSchema]);

export const StudSchema = z.strictObject({ label: label(), positionMm: Vec2Schema });

export const MouthSchema = z.strictObject({
  outline: OutlineSchema,
  /** How deep the mouth runs below the deck before it opens into the crank chamber. */
  depthMm: lengthMm(),
});

export const PocketSchema = z.strictObject({
  label: label(),
  outline: OutlineSchema,
  /** Depth below the deck where the pocket starts (0 = open at the deck). A cut shallower than this cannot reach it. */
  startDepthMm: nonNegativeMm().default(0),
});

/**
 * The crank chamber below the mouth. The crank axis runs along the case frame's x axis, square under the
 * cylinder axis; the webs (flywheels) are centred on the cylinder axis along it.
 */
export const CrankChamberSchema = z.strictObject({
  /** From the deck down to the crank axis. */
  deckToAxisMm: lengthMm(),
  /** Outer radius of the crank webs (flywheels) about the crank axis. */
  webRadiusMm: lengthMm(),
  /** Width of the webs across the cylinder axis, measured along the crank axis (outer face to outer face). */
  webSpanMm: lengthMm(),
});

/** A port window of a kit's base gasket, in the case's frame at the deck. */
export const PortWindowSchema = z.strictObject({ label: label(), outline: OutlineSchema });

/** A kit's base gasket at the deck, in the case's frame: its outline (optional) and its transfer-port windows. */
export const BaseGasketSchema = z
  .strictObject({
    outline: OutlineSchema.optional(),
    ports: z.array(PortWindowSchema).max(16).default([]),
  })
  .superRefine((g, ctx) => {
    const seen = new Set<string>();
    g.ports.forEach((p, i) => {
      if (seen.has(p.label)) ctx.addIssue({ code: "custom", path: ["ports", i, "label"], message: `duplicate port label "${p.label}"` });
      seen.add(p.label);
    });
  });

export const CaseProfileSchema = z
  .strictObject({
    name: label(),
    deck: OutlineSchema,
    mouth: MouthSchema,
    studs: z.array(StudSchema).min(1).max(16),
    studHoleDiameterMm: lengthMm(),
    studThread: ThreadDesignationSchema.optional(),
    pockets: z.array(PocketSchema).max(32).default([]),
    stockBoreMm: lengthMm(),
    strokeMm: lengthMm(),
    cylinders: z.number().int().min(1).max(12).default(1),
    /** Density of the case alloy; the A356.0-T6 default (MatWeb) applies when absent. */
    densityGPerCm3: z.number().positive().max(25).optional(),
    /** The measurements its shapes were drawn from (geometry/shapes.ts), kept to edit them again; the computation never reads them. */
    capture: CaptureSchema.optional(),
    /** The crank chamber; when absent the skirt's clearance to the crank webs is not checked. */
    crank: CrankChamberSchema.optional(),
  })
  .superRefine((c, ctx) => {
    const corners = outlineCorners(c.deck) + outlineCorners(c.mouth.outline) + c.pockets.reduce((n, p) => n + outlineCorners(p.outline), 0);
    if (corners > MAX_CASE_CORNERS) {
      ctx.addIssue({ code: "custom", path: [], message: `the deck, mouth and pockets have ${corners} corners together; at most ${MAX_CASE_CORNERS}` });
    }
    const seen = new Set<string>();
    c.studs.forEach((s, i) => {
      if (seen.has(s.label)) ctx.addIssue({ code: "custom", path: ["studs", i, "label"], message: `duplicate stud label "${s.label}"` });
      seen.add(s.label);
    });
  });

export const CylinderKitSchema = z.strictObject({
  id: label(),
  name: label(),
  boreMm: lengthMm(),
  /** Stroke when the kit changes it (a stroker crank); the case's stroke otherwise. */
  strokeMm: lengthMm().optional(),
  skirtDiameterReadingsMm: z.array(lengthMm()).min(1, "at least one skirt diameter reading"),
  skirtLengthReadingsMm: z.array(lengthMm()).min(1, "at least one skirt length reading"),
  studs: z.array(StudSchema).min(1).max(16),
  studThread: ThreadDesignationSchema.optional(),
  baseGasketsMm: z.array(nonNegativeMm()).default([]),
  /** True when the kit is always run with a base gasket, so the thinnest one may be subtracted from the skirt length. */
  alwaysWithGasket: z.boolean().default(false),
  price: z.number().nonnegative().optional(),
  /** The kit's base gasket with its port windows, for the port overlay. */
  baseGasket: BaseGasketSchema.optional(),
  /** The measurements its base-gasket shapes were drawn from (geometry/shapes.ts); the computation never reads them. */
  capture: CaptureSchema.optional(),
});

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

/** Corners of a kit's own outlines (its base gasket and port windows). */
function kitCorners(kit: { baseGasket?: { outline?: { kind: string; pointsMm?: readonly unknown[] }; ports: readonly { outline: { kind: string; pointsMm?: readonly unknown[] } }[] } }): number {
  const g = kit.baseGasket;
  return g ? outlineCorners(g.outline) + g.ports.reduce((n, p) => n + outlineCorners(p.outline), 0) : 0;
}

/** A study: one case, one or more candidate kits, and optionally a cut plan, a rig, holder readings and limits. */
export const StudySchema = z
  .strictObject({
    name: label().optional(),
    case: CaseProfileSchema,
    kits: z.array(CylinderKitSchema).min(1, "at least one kit").max(100),
    cut: CutPlanSchema.optional(),
    rig: BoringRigSchema.optional(),
    readings: ReadingsSchema.optional(),
    limits: StudyLimitsSchema.optional(),
  })
  .superRefine((study, ctx) => {
    const corners = outlineCorners(study.case.deck) + outlineCorners(study.case.mouth.outline) + study.case.pockets.reduce((n, p) => n + outlineCorners(p.outline), 0) + study.kits.reduce((n, k) => n + kitCorners(k), 0);
    if (corners > MAX_STUDY_CORNERS) ctx.addIssue({ code: "custom", path: [], message: `the study's outlines have ${corners} corners together; at most ${MAX_STUDY_CORNERS}` });
    const ids = new Set<string>();
    study.kits.forEach((k, i) => {
      if (ids.has(k.id)) ctx.addIssue({ code: "custom", path: ["kits", i, "id"], message: `duplicate kit id "${k.id}"` });
      ids.add(k.id);
    });
    const studs = new Set(study.case.studs.map((s) => s.label));
    const used = new Set<string>();
    study.readings?.holderHeights.forEach((r, i) => {
      if (!studs.has(r.stud)) {
        ctx.addIssue({ code: "custom", path: ["readings", "holderHeights", i, "stud"], message: `no case stud labelled "${r.stud}"` });
      } else if (used.has(r.stud)) {
        ctx.addIssue({ code: "custom", path: ["readings", "holderHeights", i, "stud"], message: `a second reading at stud "${r.stud}"` });
      }
      used.add(r.stud);
    });
  });

export type Outline = z.infer<typeof OutlineSchema>;
export type CircleOutline = z.infer<typeof CircleOutlineSchema>;
export type PolygonOutline = z.infer<typeof PolygonOutlineSchema>;
export type Stud = z.infer<typeof StudSchema>;
export type Pocket = z.infer<typeof PocketSchema>;
export type CrankChamber = z.infer<typeof CrankChamberSchema>;
export type PortWindow = z.infer<typeof PortWindowSchema>;
export type BaseGasket = z.infer<typeof BaseGasketSchema>;
export type CaseProfile = z.infer<typeof CaseProfileSchema>;
export type CylinderKit = z.infer<typeof CylinderKitSchema>;
export type BoringRig = z.infer<typeof BoringRigSchema>;
export type CutPlan = z.infer<typeof CutPlanSchema>;
export type Readings = z.infer<typeof ReadingsSchema>;
export type Limits = z.infer<typeof LimitsSchema>;
export type StudyLimits = z.infer<typeof StudyLimitsSchema>;
/** A parsed study (defaults such as empty pocket lists filled in). */
export type Study = z.infer<typeof StudySchema>;
/** A study as written in JSON, before defaults are filled in. */
export type StudyInput = z.input<typeof StudySchema>;
