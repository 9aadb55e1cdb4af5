import type { Outline, Vec2 } from "@/geometry";

// Drawing geometry only: outlines turned into point rings for triangulation and SVG paths.

/** Segments used to draw a circle of radius r so the chord error stays under about 0.01 mm (at least 48). */
export function circleSegments(radiusMm: number): number {
  const n = Math.ceil(Math.PI / Math.acos(Math.max(-1, 1 - 0.01 / Math.max(radiusMm, 0.01))));
  return Math.min(256, Math.max(48, n));
}

/** Points of a circle, counter-clockwise from +x. */
export function circleRing(center: Vec2, radiusMm: number, segments = circleSegments(radiusMm)): Vec2[] {
  const out: Vec2[] = [];
  for (let i = 0; i < segments; i++) {
    const a = (2 * Math.PI * i) / segments;
    out.push([center[0] + radiusMm * Math.cos(a), center[1] + radiusMm * Math.sin(a)]);
  }
  return out;
}

/** Signed area (positive when counter-clockwise). */
export function ringArea(ring: readonly Vec2[]): number {
  let s = 0;
  for (let i = 0; i < ring.length; i++) {
    const [x1, y1] = ring[i];
    const [x2, y2] = ring[(i + 1) % ring.length];
    s += x1 * y2 - x2 * y1;
  }
  return s / 2;
}

/** The ring counter-clockwise. */
export function ccw(ring: readonly Vec2[]): Vec2[] {
  return ringArea(ring) >= 0 ? [...ring] : [...ring].reverse();
}

/** An outline as a counter-clockwise point ring. */
export function outlineRing(outline: Outline): Vec2[] {
  if (outline.kind === "circle") return circleRing(outline.centerMm ?? [0, 0], outline.diameterMm / 2);
  return ccw(outline.pointsMm);
}

/** Axis-aligned bounds of some rings. */
export function bounds(rings: readonly (readonly Vec2[])[]): { minX: number; minY: number; maxX: number; maxY: number } {
  let minX = Infinity, minY = Infinity, maxX = -Infinity, maxY = -Infinity;
  for (const r of rings) for (const [x, y] of r) {
    minX = Math.min(minX, x); minY = Math.min(minY, y); maxX = Math.max(maxX, x); maxY = Math.max(maxY, y);
  }
  return { minX, minY, maxX, maxY };
}

/** Where a horizontal line y = y0 is inside a ring: sorted [x0, x1] intervals. */
export function lineIntervals(ring: readonly Vec2[], y0: number): [number, number][] {
  const xs: number[] = [];
  for (let i = 0; i < ring.length; i++) {
    const [x1, y1] = ring[i];
    const [x2, y2] = ring[(i + 1) % ring.length];
    if ((y1 <= y0 && y2 > y0) || (y2 <= y0 && y1 > y0)) xs.push(x1 + ((y0 - y1) / (y2 - y1)) * (x2 - x1));
  }
  xs.sort((a, b) => a - b);
  const out: [number, number][] = [];
  for (let i = 0; i + 1 < xs.length; i += 2) out.push([xs[i], xs[i + 1]]);
  return out;
}

/** Interval set a minus the union of b. */
export function subtractIntervals(a: readonly [number, number][], b: readonly [number, number][]): [number, number][] {
  let cur = a.map((i) => [i[0], i[1]] as [number, number]);
  for (const [b0, b1] of b) {
    const next: [number, number][] = [];
    for (const [a0, a1] of cur) {
      if (b1 <= a0 || b0 >= a1) next.push([a0, a1]);
      else {
        if (b0 > a0) next.push([a0, b0]);
        if (b1 < a1) next.push([b1, a1]);
      }
    }
    cur = next;
  }
  return cur.filter(([x0, x1]) => x1 - x0 > 1e-9);
}

/** Interval set a intersected with b. */
export function intersectIntervals(a: readonly [number, number][], b: readonly [number, number][]): [number, number][] {
  const out: [number, number][] = [];
  for (const [a0, a1] of a) for (const [b0, b1] of b) {
    const x0 = Math.max(a0, b0), x1 = Math.min(a1, b1);
    if (x1 - x0 > 1e-9) out.push([x0, x1]);
  }
  return out.sort((p, q) => p[0] - q[0]);
}
