import { boundaryRelation, diskInsideArea } from "./outline";
import type { Outline } from "./schema";
import { type Vec2, add, angleDeg, scale, sub, unit } from "./vec";

/** Where and how much a skirt overlaps the case. */
export interface Interference {
  /** Area of the skirt's section outside the opening. */
  readonly areaMm2: number;
  /** Deepest radial penetration: skirt radius minus the distance from its centre to the nearest opening edge. */
  readonly deepestMm: number;
  /** The skirt's edge point that penetrates deepest. */
  readonly atMm: Vec2;
  /** Direction of that point from the skirt centre, degrees counter-clockwise from +x. */
  readonly angleDeg: number;
}

/** Radial clearance of a skirt in an opening, and the interference when it is negative. */
export interface ClearanceResult {
  /** Distance from the skirt centre to the nearest edge of the opening, minus the skirt radius (negative = interference). */
  readonly clearanceMm: number;
  readonly interference: Interference | null;
}

/**
 * Radial clearance of a skirt disk (centre c, radius r) in an opening: clearance = dist(c, edge) − r; for a
 * circle R − r − |c − C|. Interference area = πr² − area(skirt ∩ opening); for a round opening that is the
 * skirt's area minus the circle–circle lens (Wolfram MathWorld, "Circle-Circle Intersection").
 */
export function skirtClearance(c: Vec2, r: number, opening: Outline, toleranceMm: number): ClearanceResult {
  const rel = boundaryRelation(c, opening, toleranceMm);
  const clearanceMm = rel.signedDistanceMm - r;
  if (clearanceMm >= -toleranceMm) return { clearanceMm, interference: null };
  const inside = rel.signedDistanceMm >= 0;
  const u = unit(inside ? sub(rel.nearestMm, c) : sub(c, rel.nearestMm), toleranceMm);
  const areaMm2 = Math.max(0, Math.PI * r * r - diskInsideArea(c, r, opening, toleranceMm));
  return { clearanceMm, interference: { areaMm2, deepestMm: -clearanceMm, atMm: add(c, scale(u, r)), angleDeg: angleDeg(u) } };
}

/** Worst skirt diameter: the largest of the readings (several readings, the worst wins). */
export function worstSkirtDiameterMm(readingsMm: readonly number[]): number {
  return Math.max(...readingsMm);
}
