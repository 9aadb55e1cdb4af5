import Flatten from "@flatten-js/core";
import { signedArea } from "./polygon";
import type { Vec2 } from "./vec";

// Thin adapter over @flatten-js/core. Its shapes are mutable; ours are plain readonly arrays. Flatten
// polygons built here are cached per points array (a WeakMap on the readonly input, so the cache never
// outlives the study) and are never handed out, so nothing can mutate them in place.

const polygonCache = new WeakMap<readonly Vec2[], Flatten.Polygon>();

function toFlattenPolygon(points: readonly Vec2[]): Flatten.Polygon {
  let poly = polygonCache.get(points);
  if (!poly) {
    // flatten-js boolean operations treat a clockwise face as a hole: always build counter-clockwise.
    const ring = points.map((p) => [p[0], p[1]] as [number, number]);
    if (signedArea(points) < 0) ring.reverse();
    poly = new Flatten.Polygon(ring);
    polygonCache.set(points, poly);
  }
  return poly;
}

/** Distance from a point to a polygon's boundary, the nearest boundary point, and whether the point is inside. */
export interface BoundaryDistance {
  readonly distanceMm: number;
  readonly nearestMm: Vec2;
  readonly inside: boolean;
}

/** Distance from p to the polygon boundary (flatten-js Point.distanceTo) and containment. */
export function pointToPolygonBoundary(p: Vec2, points: readonly Vec2[]): BoundaryDistance {
  const poly = toFlattenPolygon(points);
  const pt = new Flatten.Point(p[0], p[1]);
  const [best, seg] = pt.distanceTo(poly);
  const nearest: Vec2 = [seg.end.x, seg.end.y];
  return { distanceMm: best, nearestMm: nearest, inside: poly.contains(pt) };
}

/** Area of the intersection of a disk and a polygon, by flatten-js BooleanOperations.intersect on the exact circle (an arc face). */
export function diskPolygonIntersectionArea(center: Vec2, radiusMm: number, points: readonly Vec2[]): number {
  const disk = new Flatten.Polygon(new Flatten.Circle(new Flatten.Point(center[0], center[1]), radiusMm));
  return Flatten.BooleanOperations.intersect(disk, toFlattenPolygon(points)).area();
}
