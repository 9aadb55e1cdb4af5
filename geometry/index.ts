// Public surface of the geometry core. Pure TypeScript: no React, no database, no I/O. Millimetres inside.

export {
  StudySchema,
  CaseProfileSchema,
  CylinderKitSchema,
  BoringRigSchema,
  CutPlanSchema,
  ReadingsSchema,
  LimitsSchema,
  StudyLimitsSchema,
  OutlineSchema,
  CircleOutlineSchema,
  PolygonOutlineSchema,
  StudSchema,
  PocketSchema,
  CrankChamberSchema,
  PortWindowSchema,
  BaseGasketSchema,
  MouthSchema,
  BitCalibrationSchema,
  HolderReadingSchema,
  ThreadDesignationSchema,
  Vec2Schema,
} from "./schema";
export type {
  Study,
  StudyInput,
  CaseProfile,
  CylinderKit,
  BoringRig,
  CutPlan,
  Readings,
  Limits,
  StudyLimits,
  Outline,
  CircleOutline,
  PolygonOutline,
  Stud,
  Pocket,
  CrankChamber,
  PortWindow,
  BaseGasket,
} from "./schema";

export {
  StudyResultSchema,
  KitResultSchema,
  VerdictSchema,
  ReasonCodeSchema,
  WarningCodeSchema,
  WarningSchema,
  InterferenceSchema,
  WallResultSchema,
  RigResultSchema,
  CutResultSchema,
  LeastCutSchema,
  CrankResultSchema,
  PortResultSchema,
} from "./result-schema";
export type { StudyResult, KitResult, Verdict, ReasonCode, WarningCode, Warning, RigResult, CutResult, WallResult, LeastCut, CrankResult, PortResult } from "./result-schema";

export { evaluateStudy, resolveLimits, proposeCutDiameterMm } from "./evaluate";
export type { EvaluateOptions, ResolvedLimits } from "./evaluate";
export { parseStudy, safeParseStudy } from "./parse";

export * from "./limits";
export { DEFAULT_TOLERANCE_MM } from "./tolerance";
export {
  MM_PER_INCH,
  DEFAULT_FRACTION_DENOMINATOR,
  mmToIn,
  inToMm,
  toFractionalInches,
  formatFractionalInches,
  formatLength,
  convertLengthsToInches,
} from "./units";
export type { LengthUnits, FractionalInches, FormatLengthOptions } from "./units";
export { GeometryError, StudyValidationError, ThreadDesignationError, DegenerateGeometryError } from "./errors";
export type { GeometryErrorCode, FieldIssue } from "./errors";

// Individual formulas, for the forms and drawings that show one figure on its own.
export { lensArea } from "./lens";
export { cutterSettingMm, cutDiameterFromSettingMm, bitReachMm, bitLengthWindowMm } from "./rig";
export { chooseDepthStop } from "./depth-stop";
export { crankClearance } from "./crank";
export {
  DEFAULT_VERIFY_TOLERANCE_MM,
  VerificationPlanError,
  planFromResult,
  cutFigures,
  bandCheck,
  measuredRadialClearance,
  measuredDepthClearance,
  measuredLands,
  toMicron,
  atLeastToMicron,
} from "./verification";
export type { VerificationPlan, MeasuredCut, BandCheck, MinimumCheck, LandCheck, CutFigures } from "./verification";
export { portSteps, passageUnderPort, matchedPassageReachMm, outlineCentroid, lineSpans } from "./ports";
export { fitPlane, tryFitPlane, tiltDeg, tiltDirectionDeg } from "./alignment";
export { spindleRpm, cuttingSpeedMPerMin } from "./speed";
export { displacementCc, roundCc } from "./displacement";
export { parseMetricThread, minorDiameterMm, ISO_262_PITCHES_MM } from "./threads";
export type { Vec2 } from "./vec";
