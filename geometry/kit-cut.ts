import { skirtClearance } from "./clearance";
import { type DepthClearance, depthClearance, requiredCutDepthMm } from "./depth";
import { DEFAULT_DEPTH_RESOLUTION_MM, DEFAULT_DIAMETER_RESOLUTION_MM, DEFAULT_SETTING_RESOLUTION_MM } from "./limits";
import { removal, type Removal } from "./removal";
import type { KitResult, LeastCut } from "./result-schema";
import { cutDiameterFromSettingMm, cutterSettingMm } from "./rig";
import type { BoringRig } from "./schema";
import { type StudyContext, axisAt } from "./study-context";
import { cleanDecimal, roundUpTo } from "./tolerance";
import { type Vec2, distance } from "./vec";
import { type Wall, featureReaches, maxCutDiameterMm, wallsForCut } from "./wall";

/** Smallest cut diameter with the minimum clearance: D = 2·(r + c_min + worst axis offset), rounded up so the cutter setting (D + D_head)/2 lands on the rig's resolution. */
export function proposeCutDiameterMm(skirtRadiusMm: number, minClearanceMm: number, worstAxisOffsetMm: number, rig: BoringRig | undefined, toleranceMm: number): number {
  const needed = 2 * (skirtRadiusMm + minClearanceMm + worstAxisOffsetMm);
  if (!rig) return cleanDecimal(roundUpTo(needed, DEFAULT_DIAMETER_RESOLUTION_MM, toleranceMm));
  const setting = roundUpTo(cutterSettingMm(needed, rig.headDiameterMm), rig.settingResolutionMm ?? DEFAULT_SETTING_RESOLUTION_MM, toleranceMm);
  return cleanDecimal(cutDiameterFromSettingMm(setting, rig.headDiameterMm));
}

/** What one kit's skirt asks of the cut, worked out before any cut is planned. */
export interface SkirtNeeds {
  readonly skirtCenterMm: Vec2;
  readonly skirtRadiusMm: number;
  readonly protrusionMm: number;
  readonly entersCase: boolean;
  /** Largest offset of the tool axis from the skirt centre over the protrusion (tilt plus centring offset). */
  readonly worstAxisOffsetMm: number;
  /** Depth at which that largest offset occurs. */
  readonly zWorstMm: number;
  /** Slope of the tilted holder, |(a, b)|: the cut's bottom varies by D·slope across. */
  readonly slope: number;
}

/** Proposed cut depth for a diameter D: protrusion + c_min + D·slope, no deeper than the mouth needs, rounded up to DEFAULT_DEPTH_RESOLUTION_MM. */
export function proposeCutDepthMm(needs: SkirtNeeds, diameterMm: number, ctx: StudyContext): number {
  const wanted = requiredCutDepthMm(Math.max(0, needs.protrusionMm), ctx.limits.minDepthClearanceMm, diameterMm * needs.slope, ctx.study.case.mouth.depthMm);
  return cleanDecimal(roundUpTo(wanted, DEFAULT_DEPTH_RESOLUTION_MM, ctx.tol));
}

/** The least cut that clears the skirt: the proposed diameter and, for it, the proposed depth. */
export function leastCutFor(needs: SkirtNeeds, ctx: StudyContext): LeastCut {
  const diameterMm = proposeCutDiameterMm(needs.skirtRadiusMm, ctx.limits.minRadialClearanceMm, needs.worstAxisOffsetMm, ctx.study.rig, ctx.tol);
  return { diameterMm, depthMm: proposeCutDepthMm(needs, diameterMm, ctx) };
}

/** A planned cut and what it does to this kit's fit and to the case. */
export interface PlannedCut {
  readonly cut: NonNullable<KitResult["cut"]>;
  /** R − r − |bearing − skirt centre|: against the cut as planned, no tilt. */
  readonly vsCutMm: number;
  /** R − r − worst axis offset: against the cut as the tilted rig cuts it. */
  readonly effectiveMm: number;
  readonly depth: DepthClearance;
  readonly depthClearanceMm: number | null;
  readonly interferenceVsCut: KitResult["interference"]["vsCut"];
  readonly walls: Wall[];
  readonly maxCutDiameterMm: number;
  readonly depthVariationMm: number;
  readonly removed: Removal;
}

/** The cut as given, each missing part proposed, with its clearances, walls (the thinner of deck and bottom when tilted) and material removed. */
export function planKitCut(needs: SkirtNeeds, ctx: StudyContext): PlannedCut {
  const { study, tol, limits: L } = ctx;
  const cs = study.case;
  const given = study.cut;
  const diameterProposed = given?.diameterMm === undefined;
  const diameterMm = given?.diameterMm ?? proposeCutDiameterMm(needs.skirtRadiusMm, L.minRadialClearanceMm, needs.worstAxisOffsetMm, study.rig, tol);
  const R = diameterMm / 2;
  const r = needs.skirtRadiusMm;
  const depthVariationMm = diameterMm * needs.slope;
  const depthProposed = given?.depthMm === undefined;
  const depthMm = given?.depthMm ?? proposeCutDepthMm(needs, diameterMm, ctx);

  const vsCutMm = R - r - distance(ctx.bearing, needs.skirtCenterMm);
  const effectiveMm = R - r - needs.worstAxisOffsetMm;
  const interferenceVsCut = needs.entersCase
    ? skirtClearance(needs.skirtCenterMm, r, { kind: "circle", diameterMm, centerMm: axisAt(ctx, needs.zWorstMm) }, tol).interference
    : null;
  const depth = depthClearance(depthMm, depthVariationMm, needs.protrusionMm, cs.mouth.depthMm, tol);

  // Walls at the deck and, when the holder is tilted, at the cut's bottom too: the thinner one counts.
  const top = axisAt(ctx, 0);
  const required = { minSealingLandMm: L.minSealingLandMm, minWallMm: L.minWallMm };
  const reachesTop = featureReaches(top, cs, depthMm, required, tol);
  let walls = wallsForCut(top, R, reachesTop, tol);
  let reaches = reachesTop;
  if (ctx.plane) {
    const bottom = axisAt(ctx, depthMm);
    const reachesBottom = featureReaches(bottom, cs, depthMm, required, tol);
    const wallsBottom = wallsForCut(bottom, R, reachesBottom, tol);
    walls = walls.map((w, i) => (wallsBottom[i].minWallMm < w.minWallMm ? wallsBottom[i] : w));
    reaches = reachesTop.map((f, i) => (reachesBottom[i].reachMm < f.reachMm ? reachesBottom[i] : f));
  }

  return {
    cut: {
      diameterMm,
      depthMm,
      proposed: diameterProposed || depthProposed,
      diameterProposed,
      depthProposed,
      centerMm: ctx.bearing,
      centerAtDeckMm: top,
      centerAtBottomMm: axisAt(ctx, depthMm),
      shallowestDepthMm: depth.shallowestDepthMm,
      throughMouth: depth.throughMouth,
    },
    vsCutMm,
    effectiveMm,
    depth,
    depthClearanceMm: needs.entersCase ? depth.depthClearanceMm : null,
    interferenceVsCut,
    walls,
    maxCutDiameterMm: maxCutDiameterMm(reaches),
    depthVariationMm,
    removed: removal(top, R, depthMm, cs.mouth.outline, cs.mouth.depthMm, ctx.densityGPerCm3, tol),
  };
}
