import Flatten from "@flatten-js/core";
import { DegenerateGeometryError } from "./errors";
import { signedArea } from "./polygon";
import type { Vec2 } from "./vec";

// Thin adapter over @flatten-js/core, the independent cross-check of the core's own polygon measures
// (polygon.ts); the evaluation itself calls none of it. Its shapes are mutable; ours are plain readonly
// arrays. Flatten polygons built here are cached per points array (a WeakMap on the readonly input) and
// never handed out, so nothing can mutate them in place. A failure of the library is a coded GeometryError.

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

/** Distance from p to the polygon boundary (flatten-js Point.distanceTo), the nearest boundary point, and containment. */
export function flattenPointToPolygonBoundary(p: Vec2, points: readonly Vec2[]): { distanceMm: number; nearestMm: Vec2; inside: boolean } {
  const poly = toFlattenPolygon(points);
  const pt = new Flatten.Point(p[0], p[1]);
  const [best, seg] = pt.distanceTo(poly);
  return { distanceMm: best, nearestMm: [seg.end.x, seg.end.y], inside: poly.contains(pt) };
}

/** Area of disk ∩ polygon by flatten-js BooleanOperations.intersect on the exact circle (an arc face); a library failure throws DegenerateGeometryError. */
export function flattenDiskPolygonArea(center: Vec2, radiusMm: number, points: readonly Vec2[]): number {
  const disk = new Flatten.Polygon(new Flatten.Circle(new Flatten.Point(center[0], center[1]), radiusMm));
  try {
    return Flatten.BooleanOperations.intersect(disk, toFlattenPolygon(points)).area();
  } catch (cause) {
    throw new DegenerateGeometryError(`the disk ∩ polygon boolean failed (${cause instanceof Error ? cause.message : String(cause)})`);
  }
}
