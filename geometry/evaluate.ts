import { type PlaneFit, axisAtDepthMm, lateralShiftMm, tiltDeg, tiltDirectionDeg, tryFitPlane } from "./alignment";
import { skirtClearance, worstSkirtDiameterMm } from "./clearance";
import { depthClearance, requiredCutDepthMm, skirtProtrusionMm } from "./depth";
import { chooseDepthStop } from "./depth-stop";
import { displacementCc, roundCc, thresholdsCrossedCc } from "./displacement";
import {
  DEFAULT_CASE_DENSITY_G_PER_CM3,
  DEFAULT_DEPTH_RESOLUTION_MM,
  DEFAULT_DIAMETER_RESOLUTION_MM,
  DEFAULT_LIMITS,
  DEFAULT_SETTING_RESOLUTION_MM,
  type LimitName,
} from "./limits";
import { removal } from "./removal";
import type { KitResult, RigResult, StudyResult, Warning } from "./result-schema";
import { checkBit, cutDiameterFromSettingMm, cutterSettingMm, hardwareClearanceMm } from "./rig";
import type { BoringRig, CylinderKit, Study, StudyLimits } from "./schema";
import { spindleSpeed } from "./speed";
import { matchStudPattern } from "./studs";
import { threadsMatch } from "./threads";
import { DEFAULT_TOLERANCE_MM, cleanDecimal, roundUpTo } from "./tolerance";
import { ORIGIN, type Vec2, add, centroid, distance } from "./vec";
import { decideVerdict } from "./verdict";
import { type Wall, featureReaches, maxCutDiameterMm, thinnestWall, wallsForCut } from "./wall";
import { messages, warning } from "./warnings";

/** Options of evaluateStudy. */
export interface EvaluateOptions {
  /** Length tolerance for every comparison on computed values (default DEFAULT_TOLERANCE_MM). */
  readonly toleranceMm?: number;
}

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
    cuttingSpeedMinMPerMin: pick("cuttingSpeedMinMPerMin") ?? DEFAULT_LIMITS.cuttingSpeedMinMPerMin,
    cuttingSpeedMaxMPerMin: pick("cuttingSpeedMaxMPerMin") ?? DEFAULT_LIMITS.cuttingSpeedMaxMPerMin,
    displacementClassesCc: [...(pick("displacementClassesCc") ?? DEFAULT_LIMITS.displacementClassesCc)],
  };
  return { values, defaulted };
}

/** Everything case-wide that each kit's evaluation shares. */
interface StudyContext {
  readonly study: Study;
  readonly tol: number;
  readonly limits: ResolvedLimits["values"];
  readonly bearing: Vec2;
  readonly plane: PlaneFit | null;
  readonly densityGPerCm3: number;
  readonly densityDefaulted: boolean;
  readonly stockCc: number;
  readonly caseMaxCutDiameterMm: number;
}

/** Smallest cut diameter with the minimum clearance: D = 2·(r + c_min + worst axis offset), rounded up so the cutter setting (D + D_head)/2 lands on the rig's resolution. */
export function proposeCutDiameterMm(skirtRadiusMm: number, minClearanceMm: number, worstAxisOffsetMm: number, rig: BoringRig | undefined, toleranceMm: number): number {
  const needed = 2 * (skirtRadiusMm + minClearanceMm + worstAxisOffsetMm);
  if (!rig) return cleanDecimal(roundUpTo(needed, DEFAULT_DIAMETER_RESOLUTION_MM, toleranceMm));
  const setting = roundUpTo(cutterSettingMm(needed, rig.headDiameterMm), rig.settingResolutionMm ?? DEFAULT_SETTING_RESOLUTION_MM, toleranceMm);
  return cleanDecimal(cutDiameterFromSettingMm(setting, rig.headDiameterMm));
}

/**
 * Evaluates a parsed study: one result per kit (verdict, clearances, cut, walls, rig set-up, alignment,
 * displacement, material removed, warnings) and the case-wide figures. Pure, synchronous, deterministic.
 */
export function evaluateStudy(study: Study, options: EvaluateOptions = {}): StudyResult {
  const tol = options.toleranceMm ?? DEFAULT_TOLERANCE_MM;
  const limits = resolveLimits(study.limits);
  const L = limits.values;
  const cs = study.case;
  const warnings: Warning[] = [];
  const studPatternCenterMm = centroid(cs.studs.map((s) => s.positionMm));
  const bearing = add(studPatternCenterMm, study.cut?.centerOffsetMm ?? ORIGIN);

  let plane: PlaneFit | null = null;
  let alignment: StudyResult["alignment"] = null;
  const readings = study.readings?.holderHeights ?? [];
  if (readings.length > 0) {
    const byLabel = new Map(cs.studs.map((s) => [s.label, s.positionMm] as const));
    const points = readings.flatMap((r) => {
      const at = byLabel.get(r.stud);
      return at ? [{ stud: r.stud, atMm: at, heightMm: r.heightMm + r.straightedgeMm }] : [];
    });
    plane = tryFitPlane(points);
    if (!plane) {
      warnings.push(warning("readings-insufficient", messages.readingsInsufficient()));
    } else {
      const fit = plane;
      alignment = {
        a: fit.a,
        b: fit.b,
        cMm: fit.cMm,
        tiltDeg: tiltDeg(fit),
        directionDeg: tiltDirectionDeg(fit),
        rockMm: fit.rockMm,
        residuals: points.map((p, i) => ({ stud: p.stud, residualMm: fit.residualsMm[i] })),
      };
      if (fit.rockMm > L.maxRockMm + tol) warnings.push(warning("holder-rocks", messages.holderRocks(fit.rockMm, L.maxRockMm)));
    }
  }

  let rigThread: StudyResult["case"]["rigThread"] = null;
  if (cs.studThread && study.rig?.studThread) {
    const m = threadsMatch(cs.studThread, study.rig.studThread, tol);
    rigThread = { case: m.a, rig: m.b, ok: m.ok };
    if (!m.ok) warnings.push(warning("thread-mismatch", messages.threadMismatch(m.a, m.b)));
  }

  const caseMaxCutDiameterMm = maxCutDiameterMm(featureReaches(bearing, cs, cs.mouth.depthMm, L, tol));
  const ctx: StudyContext = {
    study,
    tol,
    limits: L,
    bearing,
    plane,
    densityGPerCm3: cs.densityGPerCm3 ?? DEFAULT_CASE_DENSITY_G_PER_CM3,
    densityDefaulted: cs.densityGPerCm3 === undefined,
    stockCc: displacementCc(cs.stockBoreMm, cs.strokeMm, cs.cylinders),
    caseMaxCutDiameterMm,
  };

  return {
    kits: study.kits.map((k) => evaluateKit(k, ctx)),
    case: { studPatternCenterMm, mouthDepthMm: cs.mouth.depthMm, maxCutDiameterMm: caseMaxCutDiameterMm, stockDisplacementCc: ctx.stockCc, rigThread },
    alignment,
    limits: { values: L, defaulted: limits.defaulted },
    toleranceMm: tol,
    warnings,
  };
}

function evaluateKit(kit: CylinderKit, ctx: StudyContext): KitResult {
  const { study, tol, limits: L, plane, bearing } = ctx;
  const cs = study.case;
  const rig = study.rig;
  const warnings: Warning[] = [];
  const skirtCenter = ORIGIN;
  const skirtDiameterMm = worstSkirtDiameterMm(kit.skirtDiameterReadingsMm);
  const r = skirtDiameterMm / 2;
  const depth = skirtProtrusionMm(kit);
  const protrusionMm = depth.protrusionMm;
  const entersCase = protrusionMm > tol;

  const vsMouth = skirtClearance(skirtCenter, r, cs.mouth.outline, tol);
  const clearsMouth = !entersCase || vsMouth.clearanceMm >= L.minRadialClearanceMm - tol;

  const studs = matchStudPattern(kit.studs, cs.studs, L.studToleranceMm, tol);
  if (!studs.ok) warnings.push(warning("stud-pattern-mismatch", messages.studMismatch(studs.worstOffsetMm, studs.sharedCaseStuds)));
  let thread: KitResult["studMatch"]["thread"] = null;
  if (kit.studThread && cs.studThread) {
    const m = threadsMatch(cs.studThread, kit.studThread, tol);
    thread = { case: m.a, kit: m.b, ok: m.ok };
    if (!m.ok) warnings.push(warning("kit-thread-differs", messages.kitThreadDiffers(m.a, m.b)));
  }

  // The skirt meets the mouth wall only down to the mouth depth; below it is the crank chamber.
  const zSkirtMm = Math.max(0, Math.min(protrusionMm, cs.mouth.depthMm));
  const axisAt = (z: number): Vec2 => (plane ? axisAtDepthMm(plane, bearing, z) : bearing);
  const offTop = distance(axisAt(0), skirtCenter);
  const offBottom = distance(axisAt(zSkirtMm), skirtCenter);
  const worstAxisOffsetMm = Math.max(offTop, offBottom);
  const zWorst = offBottom > offTop ? zSkirtMm : 0;
  const slope = plane ? Math.hypot(plane.a, plane.b) : 0;

  const given = study.cut;
  const planCut = !clearsMouth || given?.diameterMm !== undefined || given?.depthMm !== undefined;
  const proposeDepth = (diameterMm: number) =>
    cleanDecimal(roundUpTo(requiredCutDepthMm(Math.max(0, protrusionMm), L.minDepthClearanceMm, diameterMm * slope, cs.mouth.depthMm), DEFAULT_DEPTH_RESOLUTION_MM, tol));
  // The least cut that clears this kit, whatever cut is planned: the cut the core proposes when none is given.
  let leastCut: KitResult["leastCut"] = null;
  if (!clearsMouth) {
    const leastDiameterMm = proposeCutDiameterMm(r, L.minRadialClearanceMm, worstAxisOffsetMm, rig, tol);
    leastCut = { diameterMm: leastDiameterMm, depthMm: proposeDepth(leastDiameterMm) };
  }

  let cut: KitResult["cut"] = null;
  let vsCut: number | null = null;
  let effective: number | null = null;
  let depthClearanceMm: number | null = null;
  let interferenceVsCut: KitResult["interference"]["vsCut"] = null;
  let walls: Wall[] = [];
  let maxCut = ctx.caseMaxCutDiameterMm;
  let rigResult: RigResult | null = null;
  let removed = { areaMm2: 0, volumeMm3: 0, massG: 0 };
  let depthVariation = 0;

  if (planCut) {
    const diameterProposed = given?.diameterMm === undefined;
    const diameterMm = given?.diameterMm ?? proposeCutDiameterMm(r, L.minRadialClearanceMm, worstAxisOffsetMm, rig, tol);
    const R = diameterMm / 2;
    depthVariation = diameterMm * slope;
    const depthProposed = given?.depthMm === undefined;
    const depthMm = given?.depthMm ?? proposeDepth(diameterMm);

    vsCut = R - r - distance(bearing, skirtCenter);
    effective = R - r - worstAxisOffsetMm;
    if (entersCase) {
      interferenceVsCut = skirtClearance(skirtCenter, r, { kind: "circle", diameterMm, centerMm: axisAt(zWorst) }, tol).interference;
    }
    const dc = depthClearance(depthMm, depthVariation, protrusionMm, cs.mouth.depthMm, tol);
    depthClearanceMm = entersCase ? dc.depthClearanceMm : null;

    // Walls at the deck and, when the holder is tilted, at the cut's bottom too: the thinner one counts.
    const top = axisAt(0);
    const required = { minSealingLandMm: L.minSealingLandMm, minWallMm: L.minWallMm };
    const reachesTop = featureReaches(top, cs, depthMm, required, tol);
    walls = wallsForCut(top, R, reachesTop, tol);
    let reaches = reachesTop;
    if (plane) {
      const bottom = axisAt(depthMm);
      const reachesBottom = featureReaches(bottom, cs, depthMm, required, tol);
      const wallsBottom = wallsForCut(bottom, R, reachesBottom, tol);
      walls = walls.map((w, i) => (wallsBottom[i].minWallMm < w.minWallMm ? wallsBottom[i] : w));
      reaches = reachesTop.map((f, i) => (reachesBottom[i].reachMm < f.reachMm ? reachesBottom[i] : f));
    }
    maxCut = maxCutDiameterMm(reaches);
    removed = removal(top, R, depthMm, cs.mouth.outline, cs.mouth.depthMm, ctx.densityGPerCm3, tol);

    cut = {
      diameterMm,
      depthMm,
      proposed: diameterProposed || depthProposed,
      diameterProposed,
      depthProposed,
      centerMm: bearing,
      centerAtDeckMm: top,
      centerAtBottomMm: axisAt(depthMm),
      shallowestDepthMm: dc.shallowestDepthMm,
      throughMouth: dc.throughMouth,
    };

    if (rig) rigResult = rigSetup(rig, diameterMm, depthMm, L, tol, warnings);

    if (entersCase && effective < L.minRadialClearanceMm - tol) {
      if (plane && vsCut >= L.minRadialClearanceMm - tol) {
        warnings.push(warning("tilt-eats-clearance", messages.tiltEats(vsCut, effective, tiltDeg(plane))));
      } else {
        warnings.push(warning("radial-clearance-below-minimum", messages.radialBelowMin(effective, L.minRadialClearanceMm)));
      }
    }
    if (depthClearanceMm !== null && depthClearanceMm < L.minDepthClearanceMm - tol) {
      warnings.push(warning("depth-clearance-below-minimum", messages.depthBelowMin(depthClearanceMm, L.minDepthClearanceMm)));
    }
    for (const w of walls) {
      if (w.ok) continue;
      if (w.minWallMm < -tol) {
        if (w.kind === "stud") warnings.push(warning("cut-breaks-into-stud-hole", messages.breaksStud(w.label, -w.minWallMm)));
        else if (w.kind === "pocket") warnings.push(warning("cut-breaks-into-pocket", messages.breaksPocket(w.label, -w.minWallMm)));
        else warnings.push(warning("cut-breaks-through-deck", messages.breaksDeck(-w.minWallMm)));
      } else if (w.kind === "stud") {
        warnings.push(warning("sealing-land-below-minimum", messages.landBelowMin(w.label, w.minWallMm, w.requiredMm)));
      } else {
        warnings.push(warning("wall-below-minimum", messages.wallBelowMin(w.label, w.minWallMm, w.requiredMm)));
      }
    }
    if (dc.throughMouth) warnings.push(warning("cut-through-mouth", messages.throughMouth()));
    if (clearsMouth) warnings.push(warning("cut-not-needed", messages.cutNotNeeded()));
  }

  const { verdict, reasons } = decideVerdict(
    {
      studsOk: studs.ok,
      entersCase,
      clearsMouth,
      cut:
        cut && effective !== null
          ? { effectiveRadialClearanceMm: effective, depthClearanceMm, walls, diameterMm: cut.diameterMm, maxCutDiameterMm: maxCut }
          : null,
      minRadialClearanceMm: L.minRadialClearanceMm,
      minDepthClearanceMm: L.minDepthClearanceMm,
    },
    tol,
  );

  const kitCc = displacementCc(kit.boreMm, kit.strokeMm ?? cs.strokeMm, cs.cylinders);
  const crossesClasses = thresholdsCrossedCc(ctx.stockCc, kitCc, L.displacementClassesCc);
  for (const t of crossesClasses) warnings.push(warning("displacement-crosses-class", messages.crossesClass(ctx.stockCc, kitCc, t)));

  return {
    kitId: kit.id,
    name: kit.name,
    verdict,
    reasons,
    skirt: { centerMm: skirtCenter, diameterMm: skirtDiameterMm, lengthMm: depth.lengthMm, gasketMm: depth.gasketMm, protrusionMm },
    cut,
    leastCut,
    radialClearanceMm: { vsMouth: vsMouth.clearanceMm, vsCut },
    effectiveRadialClearanceMm: effective,
    depthClearanceMm,
    interference: { vsMouth: entersCase ? vsMouth.interference : null, vsCut: interferenceVsCut },
    walls,
    thinnestWall: thinnestWall(walls),
    maxCutDiameterMm: maxCut,
    studMatch: { ok: studs.ok, worstOffsetMm: studs.worstOffsetMm, studs: studs.studs, sharedCaseStuds: studs.sharedCaseStuds, thread },
    rig: rigResult,
    alignment: plane
      ? {
          tiltDeg: tiltDeg(plane),
          directionDeg: tiltDirectionDeg(plane),
          rockMm: plane.rockMm,
          lateralShiftMm: lateralShiftMm(plane, bearing, cut ? cut.depthMm : zSkirtMm),
          depthVariationMm: depthVariation,
          worstAxisOffsetMm,
        }
      : null,
    displacementCc: { stock: ctx.stockCc, kit: kitCc, change: kitCc - ctx.stockCc, stockRounded: roundCc(ctx.stockCc), kitRounded: roundCc(kitCc), crossesClasses },
    removal: { ...removed, densityGPerCm3: ctx.densityGPerCm3, densityDefaulted: ctx.densityDefaulted },
    warnings,
  };
}

function rigSetup(rig: BoringRig, diameterMm: number, depthMm: number, L: ResolvedLimits["values"], tol: number, warnings: Warning[]): RigResult {
  const bit = checkBit(diameterMm, rig, tol);
  if (!bit.reaches) {
    warnings.push(
      warning("bit-cannot-reach", bit.grindOffMm > 0 ? messages.bitTooLong(bit.grindOffMm, diameterMm) : messages.bitTooShort(bit.tooShortByMm, diameterMm)),
    );
  }
  let hardwareClearance: number | null = null;
  let hardwareClears: boolean | null = null;
  if (rig.hardwareRadiusMm !== undefined) {
    hardwareClearance = hardwareClearanceMm(diameterMm, rig.hardwareRadiusMm);
    hardwareClears = hardwareClearance >= L.hardwareMarginMm - tol;
    if (!hardwareClears) warnings.push(warning("hardware-strikes", messages.hardwareStrikes(hardwareClearance, L.hardwareMarginMm)));
  }
  const depthStop = chooseDepthStop(depthMm, rig, tol);
  if (!depthStop.reached) warnings.push(warning("depth-stop-unreachable", messages.depthStopUnreachable(depthMm, depthStop.travelMm)));
  const speed = spindleSpeed(diameterMm, L.cuttingSpeedMinMPerMin, L.cuttingSpeedMaxMPerMin, rig.drillTopRpm);
  if (speed.drillTooSlow) warnings.push(warning("drill-too-slow", messages.drillTooSlow(speed.drillTopRpm, speed.min)));
  const resolutionMm = rig.settingResolutionMm ?? DEFAULT_SETTING_RESOLUTION_MM;
  const toSetMm = cleanDecimal(roundUpTo(cutterSettingMm(diameterMm, rig.headDiameterMm), resolutionMm, tol));
  return {
    cutterSettingMm: cutterSettingMm(diameterMm, rig.headDiameterMm),
    cutterSettingToSetMm: toSetMm,
    cutAtSettingMm: cleanDecimal(cutDiameterFromSettingMm(toSetMm, rig.headDiameterMm)),
    settingResolutionMm: resolutionMm,
    bitLengthMm: rig.bitLengthMm,
    bitReachMm: bit.reachMm,
    bitReaches: bit.reaches,
    bitLengthWindowMm: bit.windowMm,
    grindOffMm: bit.grindOffMm,
    bitTooShortByMm: bit.tooShortByMm,
    hardwareClearanceMm: hardwareClearance,
    hardwareClears,
    depthStop,
    spindleRpm: speed,
  };
}
