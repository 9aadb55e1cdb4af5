import polygonClipping, { type MultiPolygon, type Polygon } from "polygon-clipping";
import type { Vec2 } from "@/geometry";

// Boolean operations on deck-plane regions, for drawing only (polygon-clipping, a Martinez-Rueda sweep).

/** A region of the deck plane: an outer ring and holes. */
export interface Region {
  readonly outer: readonly Vec2[];
  readonly holes: readonly (readonly Vec2[])[];
}

function toPoly(ring: readonly Vec2[]): Polygon {
  return [ring.map(([x, y]) => [x, y] as [number, number])];
}

function toRegions(mp: MultiPolygon): Region[] {
  const open = (r: [number, number][]) => {
    const pts = r.map(([x, y]) => [x, y] as Vec2);
    const f = pts[0], l = pts[pts.length - 1];
    if (pts.length > 1 && f[0] === l[0] && f[1] === l[1]) pts.pop();
    return pts;
  };
  return mp.filter((p) => p.length > 0 && p[0].length >= 4).map((p) => ({ outer: open(p[0]), holes: p.slice(1).map(open) }));
}

/** The part of `subject` outside every ring in `cutters`. */
export function ringMinus(subject: readonly Vec2[], cutters: readonly (readonly Vec2[])[]): Region[] {
  if (cutters.length === 0) return [{ outer: [...subject], holes: [] }];
  return toRegions(polygonClipping.difference(toPoly(subject), ...cutters.map(toPoly)));
}

/** Area of some regions (outer minus holes), mm². */
export function regionsArea(regions: readonly Region[]): number {
  const a = (r: readonly Vec2[]) => {
    let s = 0;
    for (let i = 0; i < r.length; i++) {
      const [x1, y1] = r[i];
      const [x2, y2] = r[(i + 1) % r.length];
      s += x1 * y2 - x2 * y1;
    }
    return Math.abs(s / 2);
  };
  return regions.reduce((sum, g) => sum + a(g.outer) - g.holes.reduce((h, r) => h + a(r), 0), 0);
}
