import { boundaryRelation } from "./outline";
import type { CaseProfile } from "./schema";
import { type Vec2, add, distance, scale, sub, unit } from "./vec";

export type WallKind = "stud" | "pocket" | "outline";

/** How far a case feature lies from the cut's centre; the wall at cut radius R is reachMm − R. */
export interface FeatureReach {
  readonly kind: WallKind;
  readonly label: string;
  /** Distance from the cut centre to the feature's nearest edge (negative when the centre is past it). */
  readonly reachMm: number;
  /** The feature's edge point nearest the cut centre. */
  readonly nearestMm: Vec2;
  /** Wall the shop requires to this feature (sealing land for studs, minimum wall otherwise). */
  readonly requiredMm: number;
  /** False for a pocket that starts below the cut's depth, so the cut cannot break into it. */
  readonly reached: boolean;
}

/** Distances from the cut centre c to every stud hole (|s − c| − d/2), pocket (distance to its region) and the deck outline (signed distance to its edge). */
export function featureReaches(
  c: Vec2,
  caseProfile: Pick<CaseProfile, "studs" | "studHoleDiameterMm" | "pockets" | "deck">,
  cutDepthMm: number,
  required: { minSealingLandMm: number; minWallMm: number },
  toleranceMm: number,
): FeatureReach[] {
  const out: FeatureReach[] = [];
  const holeR = caseProfile.studHoleDiameterMm / 2;
  for (const s of caseProfile.studs) {
    const u = unit(sub(s.positionMm, c), toleranceMm);
    out.push({
      kind: "stud",
      label: s.label,
      reachMm: distance(s.positionMm, c) - holeR,
      nearestMm: sub(s.positionMm, scale(u, holeR)),
      requiredMm: required.minSealingLandMm,
      reached: true,
    });
  }
  for (const p of caseProfile.pockets) {
    const rel = boundaryRelation(c, p.outline, toleranceMm);
    // Inside the pocket the centre itself is in the cavity: reach 0 minus how far inside.
    out.push({
      kind: "pocket",
      label: p.label,
      reachMm: -rel.signedDistanceMm,
      nearestMm: rel.nearestMm,
      requiredMm: required.minWallMm,
      reached: p.startDepthMm < cutDepthMm - toleranceMm,
    });
  }
  const deck = boundaryRelation(c, caseProfile.deck, toleranceMm);
  out.push({ kind: "outline", label: "deck outline", reachMm: deck.signedDistanceMm, nearestMm: deck.nearestMm, requiredMm: required.minWallMm, reached: true });
  return out;
}

/** The wall left between a cut and one feature. */
export interface Wall {
  readonly kind: WallKind;
  readonly label: string;
  /** Thinnest wall between the cut and the feature: reach − R (negative = the cut breaks into it). */
  readonly minWallMm: number;
  readonly requiredMm: number;
  readonly reached: boolean;
  readonly ok: boolean;
  /** Point on the feature nearest the cut (for drawing the dimension). */
  readonly atMm: Vec2;
  /** Point on the cut's edge nearest the feature. */
  readonly cutPointMm: Vec2;
}

/** Walls at cut radius R: minWall = reach − R for every feature, ok when ≥ the required wall (or the cut cannot reach it). */
export function wallsForCut(c: Vec2, radiusMm: number, reaches: readonly FeatureReach[], toleranceMm: number): Wall[] {
  return reaches.map((f) => {
    const minWallMm = f.reachMm - radiusMm;
    const dir = unit(sub(f.nearestMm, c), toleranceMm);
    return {
      kind: f.kind,
      label: f.label,
      minWallMm,
      requiredMm: f.requiredMm,
      reached: f.reached,
      ok: !f.reached || minWallMm >= f.requiredMm - toleranceMm,
      atMm: f.nearestMm,
      cutPointMm: add(c, scale(dir, radiusMm)),
    };
  });
}

/** Largest cut diameter that keeps every required wall: D = 2·min(reachᵢ − requiredᵢ) over the features the cut reaches (0 when none can be kept). */
export function maxCutDiameterMm(reaches: readonly FeatureReach[]): number {
  let r = Infinity;
  for (const f of reaches) if (f.reached) r = Math.min(r, f.reachMm - f.requiredMm);
  return Number.isFinite(r) ? Math.max(0, 2 * r) : 0;
}

/** The thinnest wall among those the cut reaches, or null when there are none. */
export function thinnestWall(walls: readonly Wall[]): Wall | null {
  let best: Wall | null = null;
  for (const w of walls) if (w.reached && (best === null || w.minWallMm < best.minWallMm)) best = w;
  return best;
}
