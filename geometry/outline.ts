import { lensArea } from "./lens";
import { diskPolygonArea, pointToPolygonBoundary, polygonInsideDisk, signedArea } from "./polygon";
import type { Outline } from "./schema";
import { ORIGIN, type Vec2, add, distance, scale, sub, unit } from "./vec";

/** Centre of a circle outline (the origin when not given). */
export function circleCenter(outline: Extract<Outline, { kind: "circle" }>): Vec2 {
  return outline.centerMm ?? ORIGIN;
}

/** Where a point lies relative to an outline's boundary. */
export interface BoundaryRelation {
  /** Distance to the boundary, positive inside the outline and negative outside. */
  readonly signedDistanceMm: number;
  /** The boundary point nearest to p. */
  readonly nearestMm: Vec2;
}

/** Signed distance from p to an outline's boundary: circle R − |p − c|, polygon ± the least distance to an edge (+ inside). */
export function boundaryRelation(p: Vec2, outline: Outline, toleranceMm: number): BoundaryRelation {
  if (outline.kind === "circle") {
    const c = circleCenter(outline);
    const R = outline.diameterMm / 2;
    const u = unit(sub(p, c), toleranceMm);
    return { signedDistanceMm: R - distance(p, c), nearestMm: add(c, scale(u, R)) };
  }
  const b = pointToPolygonBoundary(p, outline.pointsMm, toleranceMm);
  return { signedDistanceMm: b.inside ? b.distanceMm : -b.distanceMm, nearestMm: b.nearestMm };
}

/** Area enclosed by an outline: π·D²/4 or the shoelace area. */
export function outlineArea(outline: Outline): number {
  return outline.kind === "circle" ? (Math.PI * outline.diameterMm ** 2) / 4 : Math.abs(signedArea(outline.pointsMm));
}

/** Area of a disk (centre c, radius r) inside an outline: the circle–circle lens, or the exact disk ∩ polygon area (diskPolygonArea; containment decides the plain cases). */
export function diskInsideArea(c: Vec2, r: number, outline: Outline, toleranceMm: number): number {
  if (outline.kind === "circle") return lensArea(r, outline.diameterMm / 2, distance(c, circleCenter(outline)));
  const rel = boundaryRelation(c, outline, toleranceMm);
  if (rel.signedDistanceMm >= r - toleranceMm) return Math.PI * r * r;
  if (rel.signedDistanceMm <= -r + toleranceMm) return 0;
  if (polygonInsideDisk(outline.pointsMm, c, r, toleranceMm)) return Math.abs(signedArea(outline.pointsMm));
  return diskPolygonArea(c, r, outline.pointsMm);
}
