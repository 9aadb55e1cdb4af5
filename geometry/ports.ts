import { boundaryRelation, circleCenter } from "./outline";
import { signedArea } from "./polygon";
import type { Outline, Pocket, PortWindow } from "./schema";
import { ORIGIN, type Vec2, add, angleDeg, distance, scale, sub, unit } from "./vec";

// The port overlay. A port window of the kit's base gasket sits over a case passage (a pocket) at the deck.
// Its edges are measured on two section lines through the port's area centroid: the radial line from the
// bore axis (the origin) through the centroid, which crosses the inner edge (toward the bore) and the outer
// edge, and the line square to it, which crosses the two side edges (counter-clockwise and clockwise about
// the bore axis). On each line the step at an edge is how far the passage's edge lies inside the port's:
// positive where the passage is narrower than the port (a ledge the gas meets), negative where it is wider.

/** Area centroid of an outline: the circle's centre, or the polygon's (Σ (pᵢ + pᵢ₊₁)·(xᵢyᵢ₊₁ − xᵢ₊₁yᵢ)) / 6A. */
export function outlineCentroid(outline: Outline): Vec2 {
  if (outline.kind === "circle") return circleCenter(outline);
  const pts = outline.pointsMm;
  const A = signedArea(pts);
  let x = 0;
  let y = 0;
  for (let i = 0, n = pts.length; i < n; i++) {
    const p = pts[i];
    const q = pts[(i + 1) % n];
    const w = p[0] * q[1] - q[0] * p[1];
    x += (p[0] + q[0]) * w;
    y += (p[1] + q[1]) * w;
  }
  return [x / (6 * A), y / (6 * A)];
}

/** A stretch of a section line, as distances along it from its origin point. */
export interface Span {
  readonly from: number;
  readonly to: number;
}

/** The stretches of the line o + t·d (d a unit vector) inside an outline, sorted: the circle's chord, or the polygon's crossings paired in order (half-open rule at vertices). */
export function lineSpans(o: Vec2, d: Vec2, outline: Outline): Span[] {
  if (outline.kind === "circle") {
    const c = circleCenter(outline);
    const R = outline.diameterMm / 2;
    const m = (c[0] - o[0]) * d[0] + (c[1] - o[1]) * d[1];
    const off2 = distance(o, c) ** 2 - m * m;
    if (off2 >= R * R) return [];
    const half = Math.sqrt(R * R - off2);
    return [{ from: m - half, to: m + half }];
  }
  const side = (p: Vec2) => d[0] * (p[1] - o[1]) - d[1] * (p[0] - o[0]);
  const ts: number[] = [];
  const pts = outline.pointsMm;
  for (let i = 0, n = pts.length; i < n; i++) {
    const a = pts[i];
    const b = pts[(i + 1) % n];
    const wa = side(a);
    const wb = side(b);
    if (wa > 0 === wb > 0) continue;
    const s = wa / (wa - wb);
    const p = add(a, scale(sub(b, a), s));
    ts.push((p[0] - o[0]) * d[0] + (p[1] - o[1]) * d[1]);
  }
  ts.sort((p, q) => p - q);
  const spans: Span[] = [];
  for (let i = 0; i + 1 < ts.length; i += 2) spans.push({ from: ts[i], to: ts[i + 1] });
  return spans;
}

/** The port's stretch of a section line: the one holding the centroid (t = 0), else the longest. */
function portSpan(spans: readonly Span[]): Span | null {
  if (spans.length === 0) return null;
  return spans.find((s) => s.from <= 0 && s.to >= 0) ?? [...spans].sort((p, q) => q.to - q.from - (p.to - p.from))[0];
}

/** The passage's stretch over the port's: from the first to the last of its stretches that overlap the port's, or null when none does. */
function passageSpan(spans: readonly Span[], port: Span, toleranceMm: number): Span | null {
  const over = spans.filter((s) => s.to > port.from + toleranceMm && s.from < port.to - toleranceMm);
  if (over.length === 0) return null;
  return { from: Math.min(...over.map((s) => s.from)), to: Math.max(...over.map((s) => s.to)) };
}

/** The steps at a port's four edges, mm: positive where the passage is narrower than the port; null where the section line does not meet the passage. */
export interface PortSteps {
  /** On the radial line, at the edge toward the bore: passage's inner edge − port's inner edge. */
  readonly innerMm: number | null;
  /** On the radial line, at the edge away from the bore: port's outer edge − passage's outer edge. */
  readonly outerMm: number | null;
  /** On the square line, at the counter-clockwise side edge: port's edge − passage's edge along that way. */
  readonly ccwMm: number | null;
  /** On the square line, at the clockwise side edge. */
  readonly cwMm: number | null;
}

/** How a port window lies over a passage. */
export interface PortOverlay {
  /** Port's area centroid, where both section lines cross. */
  readonly centroidMm: Vec2;
  /** Direction of the radial line from the bore axis, degrees counter-clockwise from +x. */
  readonly directionDeg: number;
  readonly steps: PortSteps;
}

/**
 * Steps between a port window and the passage under it on the two section lines through the port's centroid
 * g: radial u = g/|g| and square to it v = (−u_y, u_x). On each, with the port's stretch [p₁, p₂] and the
 * passage's [q₁, q₂]: step at the near edge q₁ − p₁, at the far edge p₂ − q₂. Plain geometry, no published source.
 */
export function portSteps(port: Outline, passage: Outline, toleranceMm: number): PortOverlay {
  const g = outlineCentroid(port);
  const u = unit(sub(g, ORIGIN), toleranceMm);
  const v: Vec2 = [-u[1], u[0]];
  const along = (d: Vec2): [number | null, number | null] => {
    const p = portSpan(lineSpans(g, d, port));
    const q = p ? passageSpan(lineSpans(g, d, passage), p, toleranceMm) : null;
    return p && q ? [q.from - p.from, p.to - q.to] : [null, null];
  };
  const [innerMm, outerMm] = along(u);
  const [cwMm, ccwMm] = along(v);
  return { centroidMm: g, directionDeg: angleDeg(u), steps: { innerMm, outerMm, ccwMm, cwMm } };
}

/**
 * The passage under a port: the one whose region holds the port's centroid, else the nearest one that one of
 * the port's section lines finds overlapping the port; null when the port sits over no passage.
 */
export function passageUnderPort(port: PortWindow, pockets: readonly Pocket[], toleranceMm: number): Pocket | null {
  const g = outlineCentroid(port.outline);
  const holding = pockets.find((p) => boundaryRelation(g, p.outline, toleranceMm).signedDistanceMm >= -toleranceMm);
  if (holding) return holding;
  const overlapping = pockets.filter((p) => {
    const s = portSteps(port.outline, p.outline, toleranceMm).steps;
    return s.innerMm !== null || s.ccwMm !== null;
  });
  if (overlapping.length === 0) return null;
  const gap = (p: Pocket) => -boundaryRelation(g, p.outline, toleranceMm).signedDistanceMm;
  return overlapping.reduce((best, p) => (gap(p) < gap(best) ? p : best));
}

/**
 * Distance from a cut centre c to a passage opened to match the port (the union of passage and port): the
 * distance to a union is the smaller of the distances to its parts, reach = min(−sd(c, passage), −sd(c, port)).
 */
export function matchedPassageReachMm(c: Vec2, passage: Outline | null, port: Outline, toleranceMm: number): number {
  const toPort = -boundaryRelation(c, port, toleranceMm).signedDistanceMm;
  if (!passage) return toPort;
  return Math.min(toPort, -boundaryRelation(c, passage, toleranceMm).signedDistanceMm);
}
