import type { CylinderKit, KitResult, Study, StudyResult, Vec2 } from "@/geometry";
import { circleRing, circleSegments, outlineRing } from "./outline";
import { ringMinus, type Region } from "./regions";

// Drawing facts shared by the 3D view and the 2D drawings, from the core's output only: how a kit's
// fit reads, where the cut's axis is drawn, and the regions where the skirt occupies case material.
// No three.js here, so the drawings and panels load without it.

/** Thickness the base flange is drawn with (the kit gives none; the flange is schematic). */
export const FLANGE_DRAWN_MM = 6;

/** How the fit state of a kit reads, from the core's numbers: interference below 0, tight below the shop minimum, clear at or above it. */
export type FitState = "interfere" | "tight" | "clear";

/** The clearance a kit's skirt has in whatever it enters (the cut when one is planned, the mouth otherwise), as the core reported it. */
export function governingClearanceMm(k: KitResult): number {
  return k.effectiveRadialClearanceMm ?? k.radialClearanceMm.vsMouth;
}

/** Fit state of a kit from the core's clearance and the shop's minimum, with the core's tolerance. */
export function fitState(k: KitResult, result: StudyResult): FitState {
  const c = governingClearanceMm(k);
  const tol = result.toleranceMm;
  if (c < -tol) return "interfere";
  if (c < result.limits.values.minRadialClearanceMm - tol) return "tight";
  return "clear";
}

/** Where the cut's axis is drawn at the deck and at its bottom: the core's centres, their offset from the skirt centre multiplied by `exaggeration`. */
export function drawnCutAxis(k: KitResult, exaggeration = 1): { top: Vec2; bottom: Vec2 } | null {
  if (!k.cut) return null;
  const s = k.skirt.centerMm;
  const f = (p: Vec2): Vec2 => [s[0] + exaggeration * (p[0] - s[0]), s[1] + exaggeration * (p[1] - s[1])];
  return { top: f(k.cut.centerAtDeckMm), bottom: f(k.cut.centerAtBottomMm) };
}

/** Radius the flange is drawn to: the kit's farthest stud plus a stud hole's diameter. */
export function flangeRadiusMm(kit: CylinderKit, k: KitResult, holeMm: number): number {
  const c = k.skirt.centerMm;
  const far = Math.max(...kit.studs.map((s) => Math.hypot(s.positionMm[0] - c[0], s.positionMm[1] - c[1])));
  return Math.max(far + holeMm, k.skirt.diameterMm / 2 + 4);
}

// Skirt minus mouth does not change while a cut is dragged: kept per mouth outline and skirt.
const outsideMouth = new WeakMap<object, Map<string, Region[]>>();

function skirtOutsideMouth(study: Study, k: KitResult): Region[] {
  const outline = study.case.mouth.outline;
  let byKit = outsideMouth.get(outline);
  if (!byKit) outsideMouth.set(outline, (byKit = new Map()));
  const key = `${k.skirt.centerMm[0]},${k.skirt.centerMm[1]},${k.skirt.diameterMm}`;
  let regions = byKit.get(key);
  if (!regions) {
    regions = ringMinus(circleRing(k.skirt.centerMm, k.skirt.diameterMm / 2), [outlineRing(outline)]);
    if (byKit.size > 64) byKit.clear();
    byKit.set(key, regions);
  }
  return regions;
}

/** A band of depth where the skirt occupies case material: beside the cut (down to its depth) or below it (outside the mouth). */
export interface InterferenceBand {
  readonly part: "beside-cut" | "below-cut";
  readonly z0: number;
  readonly z1: number;
  readonly regions: Region[];
}

/** Whether every point of `ring` lies inside the polygon drawn for a circle (within its apothem, so inside the drawn polygon too). */
function ringInsideCircle(ring: readonly Vec2[], c: Vec2, radiusMm: number): boolean {
  const apothem = radiusMm * Math.cos(Math.PI / circleSegments(radiusMm));
  return ring.every(([x, y]) => Math.hypot(x - c[0], y - c[1]) <= apothem);
}

/**
 * The bands of depth and the regions where the skirt occupies case material: outside the cut (and mouth) down
 * to the cut's depth, outside the mouth below it. The band below the cut is the same object for the same
 * skirt, mouth and depths, so a drawing can keep what it built from it while a cut's diameter is dragged.
 * With `ringsInAnyOrder` (for a caller that only fills the regions, as the 3D view does) a cut inside the
 * skirt gives the skirt's ring around it as it stands, without the polygon boolean; otherwise the rings are
 * the boolean's, point for point (the 2D drawings are written from them).
 */
export function interferenceRegions(study: Study, k: KitResult, options: { ringsInAnyOrder?: boolean } = {}): InterferenceBand[] {
  const M = study.case.mouth.depthMm;
  const P = k.skirt.protrusionMm;
  const bottom = Math.min(P, M);
  if (bottom <= 0) return [];
  const r = k.skirt.diameterMm / 2;
  const bands: InterferenceBand[] = [];
  const cutDepth = k.cut ? Math.min(k.cut.depthMm, bottom) : 0;
  if (k.cut && cutDepth > 0) {
    const c = k.cut.centerAtDeckMm, s = k.skirt.centerMm, R = k.cut.diameterMm / 2;
    // Drawing shortcuts, not clearances: a skirt disk inside the cut's circle leaves nothing to clip; a mouth
    // inside it takes nothing more away than the cut does; and a cut inside the skirt leaves a ring of skirt.
    const inside = Math.hypot(c[0] - s[0], c[1] - s[1]) + r <= R;
    const mouth = outlineRing(study.case.mouth.outline);
    const cut = circleRing(c, R);
    const mouthInCut = ringInsideCircle(mouth, c, R);
    const ring = options.ringsInAnyOrder && mouthInCut && ringInsideCircle(cut, s, r);
    const regions = inside ? [] : ring ? [{ outer: circleRing(s, r), holes: [cut] }] : ringMinus(circleRing(s, r), mouthInCut ? [cut] : [cut, mouth]);
    if (regions.length) bands.push({ part: "beside-cut", z0: 0, z1: cutDepth, regions });
  }
  if (bottom > cutDepth) {
    const regions = skirtOutsideMouth(study, k);
    if (regions.length) bands.push({ part: "below-cut", z0: cutDepth, z1: bottom, regions });
  }
  return bands;
}
