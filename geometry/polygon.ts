import type { Vec2 } from "./vec";

// Polygon measures without polygon booleans: every function here is one pass over the edges, never throws
// on a valid polygon, and works for either winding.

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

/** True when every vertex lies within distance r of c, i.e. the polygon lies inside the disk (a disk is convex). */
export function polygonInsideDisk(points: readonly Vec2[], c: Vec2, r: number, toleranceMm: number): boolean {
  const limit = (r + toleranceMm) ** 2;
  for (const p of points) {
    const dx = p[0] - c[0];
    const dy = p[1] - c[1];
    if (dx * dx + dy * dy > limit) return false;
  }
  return true;
}

/**
 * True when p lies inside the polygon (on the boundary counts as inside), by the winding number: Σ of signed
 * upward and downward crossings of the ray to +x (Sunday, "Inclusion of a point in a polygon", geomalgorithms.com, 2001).
 */
export function pointInPolygon(p: Vec2, points: readonly Vec2[]): boolean {
  const [x, y] = p;
  let winding = 0;
  for (let i = 0, n = points.length; i < n; i++) {
    const a = points[i];
    const b = points[(i + 1) % n];
    const side = (b[0] - a[0]) * (y - a[1]) - (x - a[0]) * (b[1] - a[1]);
    if (side === 0 && x >= Math.min(a[0], b[0]) && x <= Math.max(a[0], b[0]) && y >= Math.min(a[1], b[1]) && y <= Math.max(a[1], b[1])) return true;
    if (a[1] <= y) {
      if (b[1] > y && side > 0) winding++;
    } else if (b[1] <= y && side < 0) {
      winding--;
    }
  }
  return winding !== 0;
}

/** Distance from a point to a polygon's boundary, the nearest boundary point, and whether the point is inside. */
export interface BoundaryDistance {
  readonly distanceMm: number;
  readonly nearestMm: Vec2;
  readonly inside: boolean;
}

// Winding of each polygon seen, so the edge order below costs no extra pass (a WeakMap on the readonly input).
const counterClockwise = new WeakMap<readonly Vec2[], boolean>();

/**
 * Distance from p to the polygon's boundary: the least over the edges of |p − (a + t·(b − a))| with
 * t = clamp(((p − a)·(b − a)) / |b − a|², 0, 1), and whether p is inside (winding number, as pointInPolygon), in
 * one pass. Edges are taken counter-clockwise from the first corner, and a later edge replaces the nearest only
 * when closer by more than the tolerance (equidistant edges: the first wins).
 */
export function pointToPolygonBoundary(p: Vec2, points: readonly Vec2[], toleranceMm: number): BoundaryDistance {
  const n = points.length;
  let ccw = counterClockwise.get(points);
  if (ccw === undefined) {
    ccw = signedArea(points) >= 0;
    counterClockwise.set(points, ccw);
  }
  const [x, y] = p;
  let best = Infinity;
  let nx = 0;
  let ny = 0;
  let winding = 0;
  let onEdge = false;
  for (let k = 0; k < n; k++) {
    const a = ccw ? points[k] : points[n - 1 - k];
    const b = ccw ? points[(k + 1) % n] : points[(2 * n - 2 - k) % n];
    const dx = b[0] - a[0];
    const dy = b[1] - a[1];
    const len2 = dx * dx + dy * dy;
    const t = len2 > 0 ? Math.min(1, Math.max(0, ((x - a[0]) * dx + (y - a[1]) * dy) / len2)) : 0;
    const qx = a[0] + t * dx;
    const qy = a[1] + t * dy;
    const ex = x - qx;
    const ey = y - qy;
    const d2 = ex * ex + ey * ey;
    // d < best − tol needs d² < best²; the square root is taken only then.
    if (d2 < best * best) {
      const d = Math.sqrt(d2);
      if (d < best - toleranceMm) {
        best = d;
        nx = qx;
        ny = qy;
      }
    }
    const side = dx * (y - a[1]) - (x - a[0]) * dy;
    if (side === 0 && d2 === 0) onEdge = true;
    if (a[1] <= y) {
      if (b[1] > y && side > 0) winding++;
    } else if (b[1] <= y && side < 0) {
      winding--;
    }
  }
  return { distanceMm: best, nearestMm: [nx, ny], inside: onEdge || winding !== 0 };
}

/**
 * Area of a disk (centre c, radius r) inside a simple polygon, exactly: |Σ over the edges (a, b) of the signed area
 * of disk ∩ triangle(c, a, b)|. Each edge is cut where it crosses the circle; a piece inside the circle adds the
 * triangle ½·(p × q), a piece outside adds the sector ½·r²·atan2(p × q, p · q) (the polygon-area fan with the
 * disk's boundary by Green's theorem; from memory, checked against flatten-js's exact arc boolean in the tests).
 */
export function diskPolygonArea(c: Vec2, r: number, points: readonly Vec2[]): number {
  let sum = 0;
  for (let i = 0, n = points.length; i < n; i++) {
    const a = points[i];
    const b = points[(i + 1) % n];
    sum += diskTriangleSignedArea(a[0] - c[0], a[1] - c[1], b[0] - c[0], b[1] - c[1], r);
  }
  return Math.min(Math.PI * r * r, Math.abs(sum));
}

/** Signed area of the disk of radius r about the origin intersected with the triangle (origin, a, b). */
function diskTriangleSignedArea(ax: number, ay: number, bx: number, by: number, r: number): number {
  const dx = bx - ax;
  const dy = by - ay;
  const A = dx * dx + dy * dy;
  if (A === 0) return 0;
  // |a + t·d|² = r²  ⇔  A·t² + 2B·t + C = 0, roots taken in the cancellation-free form.
  const B = ax * dx + ay * dy;
  const C = ax * ax + ay * ay - r * r;
  const disc = B * B - A * C;
  if (disc <= 0) return sector(ax, ay, bx, by, r);
  const s = Math.sqrt(disc);
  let t1: number;
  let t2: number;
  if (B > 0) {
    t1 = (-B - s) / A;
    t2 = C / (-B - s);
  } else {
    t2 = (-B + s) / A;
    t1 = C / (-B + s);
  }
  if (t1 >= 1 || t2 <= 0) return sector(ax, ay, bx, by, r);
  const u1 = Math.max(0, t1);
  const u2 = Math.min(1, t2);
  const p1x = ax + u1 * dx;
  const p1y = ay + u1 * dy;
  const p2x = ax + u2 * dx;
  const p2y = ay + u2 * dy;
  return sector(ax, ay, p1x, p1y, r) + (p1x * p2y - p2x * p1y) / 2 + sector(p2x, p2y, bx, by, r);
}

/** Signed area of the circular sector of radius r between the directions of p and q: ½·r²·∠(p, q). */
function sector(px: number, py: number, qx: number, qy: number, r: number): number {
  return (r * r * Math.atan2(px * qy - qx * py, px * qx + py * qy)) / 2;
}
