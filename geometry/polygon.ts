import type { Vec2 } from "./vec";

/** Signed area of a simple polygon by the shoelace formula, A = ½ Σ (xᵢ·yᵢ₊₁ − xᵢ₊₁·yᵢ); positive when counter-clockwise. */
export function signedArea(points: readonly Vec2[]): number {
  let s = 0;
  for (let i = 0, n = points.length; i < n; i++) {
    const p = points[i];
    const q = points[(i + 1) % n];
    s += p[0] * q[1] - q[0] * p[1];
  }
  return s / 2;
}

function orient(a: Vec2, b: Vec2, c: Vec2): number {
  return (b[0] - a[0]) * (c[1] - a[1]) - (b[1] - a[1]) * (c[0] - a[0]);
}

function segmentsCross(a: Vec2, b: Vec2, c: Vec2, d: Vec2): boolean {
  const o1 = orient(a, b, c);
  const o2 = orient(a, b, d);
  const o3 = orient(c, d, a);
  const o4 = orient(c, d, b);
  return ((o1 > 0 && o2 < 0) || (o1 < 0 && o2 > 0)) && ((o3 > 0 && o4 < 0) || (o3 < 0 && o4 > 0));
}

/** Index pairs of non-adjacent edges that cross (empty for a simple polygon); O(n²), for validation. */
export function selfIntersections(points: readonly Vec2[]): Array<[number, number]> {
  const n = points.length;
  const out: Array<[number, number]> = [];
  for (let i = 0; i < n; i++) {
    for (let j = i + 2; j < n; j++) {
      if (i === 0 && j === n - 1) continue;
      if (segmentsCross(points[i], points[(i + 1) % n], points[j], points[(j + 1) % n])) out.push([i, j]);
    }
  }
  return out;
}

/** True when every vertex lies within distance r of c, i.e. the polygon lies inside the disk (a disk is convex). */
export function polygonInsideDisk(points: readonly Vec2[], c: Vec2, r: number, toleranceMm: number): boolean {
  for (const p of points) if (Math.hypot(p[0] - c[0], p[1] - c[1]) > r + toleranceMm) return false;
  return true;
}
