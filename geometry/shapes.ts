import { z } from "zod";
import { describePolygonProblem, polygonProblem } from "./simplicity";
import type { Vec2 } from "./vec";

// Shapes from the measurements a person takes at the bench (a stud spacing read with calipers, a bolt
// circle, a chamfered deck, an arc-slot transfer passage). Each helper writes the ordinary outline or
// stud list the core reads; its own parameters may be kept beside the data (CaptureSchema) so the
// shape can be edited again by them. The core itself never reads the parameters.

/** Largest chord error when an arc is written as straight segments, mm. */
export const DEFAULT_CHORD_TOLERANCE_MM = 0.02;

type Point = [number, number];
export type PolygonShape = { kind: "polygon"; pointsMm: Point[] };
export type CircleShape = { kind: "circle"; diameterMm: number; centerMm?: Point };
export type ShapeOutline = PolygonShape | CircleShape;
export type StudPoint = { label: string; positionMm: Point };

const RAD = Math.PI / 180;
const polar = (r: number, deg: number): Point => [r * Math.cos(deg * RAD), r * Math.sin(deg * RAD)];
/** Rounds away the last floating-point dust (1e-9 mm) so that a helper's point reads as the arithmetic gives it. */
const clean = (v: number) => Math.round(v * 1e9) / 1e9 + 0;
const pt = (x: number, y: number): Point => [clean(x), clean(y)];

/**
 * Segments for an arc of radius r and angle θ so that the sagitta r·(1 − cos(θ/2n)) stays within the
 * chord tolerance: n = ⌈θ / (2·acos(1 − tol/r))⌉, at least 1.
 */
export function arcSegments(radiusMm: number, angleRad: number, chordToleranceMm = DEFAULT_CHORD_TOLERANCE_MM): number {
  if (radiusMm <= chordToleranceMm) return 1;
  const step = 2 * Math.acos(1 - chordToleranceMm / radiusMm);
  return Math.max(1, Math.ceil(Math.abs(angleRad) / step - 1e-9));
}

/** Four studs on a rectangle of the given centre distances (x across, y along), centred on the axis: front is +y. */
export function rectangularStudPattern(spacingXMm: number, spacingYMm: number): StudPoint[] {
  const x = spacingXMm / 2, y = spacingYMm / 2;
  return [
    { label: "front left", positionMm: pt(-x, y) },
    { label: "front right", positionMm: pt(x, y) },
    { label: "rear right", positionMm: pt(x, -y) },
    { label: "rear left", positionMm: pt(-x, -y) },
  ];
}

/** Studs on a bolt circle: stud i at angle start + i·360°/count (counter-clockwise from +x), radius d/2. */
export function boltCircleStuds(diameterMm: number, count: number, startDeg: number): StudPoint[] {
  return Array.from({ length: count }, (_, i) => {
    const [x, y] = polar(diameterMm / 2, startDeg + (i * 360) / count);
    return { label: `stud ${i + 1}`, positionMm: pt(x, y) };
  });
}

/** A round deck or mouth on the axis. */
export function circleOutline(diameterMm: number): CircleShape {
  return { kind: "circle", diameterMm };
}

/** A rectangle w × h centred on the axis with its corners cut at 45° by c along each side (c = 0: a plain rectangle), counter-clockwise. */
export function chamferedRectangle(widthMm: number, heightMm: number, chamferMm: number): PolygonShape {
  const x = widthMm / 2, y = heightMm / 2, c = Math.min(chamferMm, x, y);
  if (c <= 0) return { kind: "polygon", pointsMm: [pt(x, -y), pt(x, y), pt(-x, y), pt(-x, -y)] };
  return {
    kind: "polygon",
    pointsMm: [pt(x, -y + c), pt(x, y - c), pt(x - c, y), pt(-x + c, y), pt(-x, y - c), pt(-x, -y + c), pt(-x + c, -y), pt(x - c, -y)],
  };
}

/** A rectangle w × h centred on the axis with corners rounded to radius r, each quarter arc within the chord tolerance, counter-clockwise. */
export function roundedRectangle(widthMm: number, heightMm: number, radiusMm: number, chordToleranceMm = DEFAULT_CHORD_TOLERANCE_MM): PolygonShape {
  const x = widthMm / 2, y = heightMm / 2, r = Math.min(radiusMm, x, y);
  if (r <= 0) return chamferedRectangle(widthMm, heightMm, 0);
  const n = arcSegments(r, Math.PI / 2, chordToleranceMm);
  const centres: [Point, number][] = [[[x - r, y - r], 0], [[-x + r, y - r], 90], [[-x + r, -y + r], 180], [[x - r, -y + r], 270]];
  const points: Point[] = [];
  for (const [[cx, cy], a0] of centres) {
    for (let i = 0; i <= n; i++) {
      const [dx, dy] = polar(r, a0 + (90 * i) / n);
      points.push(pt(cx + dx, cy + dy));
    }
  }
  return { kind: "polygon", pointsMm: points };
}

/**
 * An arc slot (a transfer passage seen from above): between radii r₁ < r₂ about the axis, spanning
 * `spanDeg` centred on `centerDeg` (counter-clockwise from +x). The outer arc runs counter-clockwise,
 * the inner one back, each within the chord tolerance.
 */
export function arcSlot(innerRadiusMm: number, outerRadiusMm: number, spanDeg: number, centerDeg: number, chordToleranceMm = DEFAULT_CHORD_TOLERANCE_MM): PolygonShape {
  const a0 = centerDeg - spanDeg / 2;
  const arc = (r: number, reverse: boolean): Point[] => {
    const n = arcSegments(r, spanDeg * RAD, chordToleranceMm);
    return Array.from({ length: n + 1 }, (_, i) => {
      const [x, y] = polar(r, a0 + (spanDeg * (reverse ? n - i : i)) / n);
      return pt(x, y);
    });
  };
  return { kind: "polygon", pointsMm: [...arc(outerRadiusMm, false), ...arc(innerRadiusMm, true)] };
}

/**
 * A rectangular passage beside the bore: `lengthMm` along the radius at angle `angleDeg`, its near edge
 * `nearEdgeMm` from the cylinder axis, `widthMm` across the radius, counter-clockwise.
 */
export function radialRectangle(widthMm: number, lengthMm: number, nearEdgeMm: number, angleDeg: number): PolygonShape {
  const u = polar(1, angleDeg), v: Point = [-u[1], u[0]];
  const at = (along: number, across: number) => pt(u[0] * along + v[0] * across, u[1] * along + v[1] * across);
  const h = widthMm / 2, far = nearEdgeMm + lengthMm;
  return { kind: "polygon", pointsMm: [at(nearEdgeMm, -h), at(far, -h), at(far, h), at(nearEdgeMm, h)] };
}

/** The outline mirrored across the x axis (y → −y) or the y axis (x → −x); a polygon's order is reversed so it keeps its sense of rotation. */
export function mirrorOutline<O extends ShapeOutline>(outline: O, axis: "x" | "y"): O {
  const m = (p: readonly [number, number]): Point => (axis === "x" ? pt(p[0], -p[1]) : pt(-p[0], p[1]));
  if (outline.kind === "circle") return { ...outline, ...(outline.centerMm ? { centerMm: m(outline.centerMm) } : {}) };
  return { ...outline, pointsMm: [...outline.pointsMm].reverse().map(m) } as O;
}

// ── The parameters kept beside the data ─────────────────────────────────────────────────────────

const len = () => z.number().positive().max(10_000);
const deg = () => z.number().min(-360).max(360);

/** The parameters one helper was given, enough to write its shape again. */
export const ShapeParamsSchema = z.discriminatedUnion("kind", [
  z.strictObject({ kind: z.literal("rect-studs"), spacingXMm: len(), spacingYMm: len() }),
  z.strictObject({ kind: z.literal("bolt-circle"), diameterMm: len(), count: z.number().int().min(1).max(16), startDeg: deg() }),
  z.strictObject({ kind: z.literal("circle"), diameterMm: len() }),
  z.strictObject({ kind: z.literal("chamfered-rect"), widthMm: len(), heightMm: len(), chamferMm: z.number().nonnegative().max(10_000) }),
  z.strictObject({ kind: z.literal("rounded-rect"), widthMm: len(), heightMm: len(), radiusMm: z.number().nonnegative().max(10_000) }),
  z.strictObject({ kind: z.literal("arc-slot"), innerRadiusMm: len(), outerRadiusMm: len(), spanDeg: z.number().positive().max(359), centerDeg: deg() }),
  z.strictObject({ kind: z.literal("radial-rect"), widthMm: len(), lengthMm: len(), nearEdgeMm: z.number().nonnegative().max(10_000), angleDeg: deg() }),
]);
export type ShapeParams = z.infer<typeof ShapeParamsSchema>;

/** Which shape each kept set of parameters wrote: "deck", "mouth", "studs", "pockets.0", "ports.1". */
export const CaptureSchema = z.record(z.string().regex(/^(deck|mouth|studs|gasket|(pockets|ports)\.\d{1,2})$/, "unknown shape"), ShapeParamsSchema);
export type Capture = z.infer<typeof CaptureSchema>;

/** The outline a set of outline parameters writes (stud patterns give studs: see studsFromParams). */
export function outlineFromParams(p: ShapeParams, chordToleranceMm = DEFAULT_CHORD_TOLERANCE_MM): ShapeOutline | null {
  switch (p.kind) {
    case "circle":
      return circleOutline(p.diameterMm);
    case "chamfered-rect":
      return chamferedRectangle(p.widthMm, p.heightMm, p.chamferMm);
    case "rounded-rect":
      return roundedRectangle(p.widthMm, p.heightMm, p.radiusMm, chordToleranceMm);
    case "arc-slot":
      return arcSlot(p.innerRadiusMm, p.outerRadiusMm, p.spanDeg, p.centerDeg, chordToleranceMm);
    case "radial-rect":
      return radialRectangle(p.widthMm, p.lengthMm, p.nearEdgeMm, p.angleDeg);
    default:
      return null;
  }
}

/** The studs a stud-pattern parameter set writes; null for an outline's parameters. */
export function studsFromParams(p: ShapeParams): StudPoint[] | null {
  if (p.kind === "rect-studs") return rectangularStudPattern(p.spacingXMm, p.spacingYMm);
  if (p.kind === "bolt-circle") return boltCircleStuds(p.diameterMm, p.count, p.startDeg);
  return null;
}

// ── What is wrong with a shape, in words ────────────────────────────────────────────────────────

/** A problem with one shape of a profile being entered: `at` names it as CaptureSchema's keys do ("deck", "pockets.1", "studs.2"). */
export type ShapeIssue = { at: string; message: string };

/** Whether p lies inside the closed ring (even-odd ray casting; a point on the edge may go either way). */
export function insideRing(p: readonly [number, number], ring: readonly (readonly [number, number])[]): boolean {
  let inside = false;
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) {
    const [xi, yi] = ring[i], [xj, yj] = ring[j];
    if (yi > p[1] !== yj > p[1] && p[0] < ((xj - xi) * (p[1] - yi)) / (yj - yi) + xi) inside = !inside;
  }
  return inside;
}

const inside = (p: readonly [number, number], o: ShapeOutline) =>
  o.kind === "circle" ? Math.hypot(p[0] - (o.centerMm?.[0] ?? 0), p[1] - (o.centerMm?.[1] ?? 0)) < o.diameterMm / 2 : insideRing(p, o.pointsMm);

/** Why an outline cannot be used as it stands (crossing edges, no area), in the core's own words, or null. */
export function outlineProblem(o: ShapeOutline): string | null {
  if (o.kind === "circle") return o.diameterMm > 0 ? null : "the diameter must be more than 0";
  if (o.pointsMm.length < 3) return "needs at least 3 corners";
  const problem = polygonProblem(o.pointsMm as Vec2[]);
  return problem ? describePolygonProblem(problem, o.pointsMm.length) : null;
}

/** The points that stand for an outline when testing whether it lies inside another (a circle: 16 points on it). */
function samplePoints(o: ShapeOutline): [number, number][] {
  if (o.kind === "polygon") return o.pointsMm;
  const c = o.centerMm ?? [0, 0];
  return Array.from({ length: 16 }, (_, i) => {
    const [x, y] = polar(o.diameterMm / 2, i * 22.5);
    return [c[0] + x, c[1] + y];
  });
}

/**
 * The problems of a profile's shapes as drawn: an outline whose edges cross, a passage reaching outside
 * the deck, a stud inside the mouth or off the deck. Shapes that cannot be read yet are passed as null.
 */
export function shapeIssues(s: {
  deck: ShapeOutline | null;
  mouth: ShapeOutline | null;
  studs: readonly ({ positionMm: [number, number] } | null)[];
  pockets: readonly (ShapeOutline | null)[];
  /** What a pocket is called in the message ("passage", "port"). */
  pocketWord?: string;
}): ShapeIssue[] {
  const out: ShapeIssue[] = [];
  const word = s.pocketWord ?? "passage";
  const deck = s.deck && !outlineProblem(s.deck) ? s.deck : null;
  const mouth = s.mouth && !outlineProblem(s.mouth) ? s.mouth : null;
  if (s.deck && !deck) out.push({ at: "deck", message: `deck outline: ${outlineProblem(s.deck)}` });
  if (s.mouth && !mouth) out.push({ at: "mouth", message: `mouth: ${outlineProblem(s.mouth)}` });
  s.pockets.forEach((p, i) => {
    if (!p) return;
    const problem = outlineProblem(p);
    if (problem) out.push({ at: `pockets.${i}`, message: `${word} ${i + 1}: ${problem}` });
    else if (deck && samplePoints(p).some((q) => !inside(q, deck))) out.push({ at: `pockets.${i}`, message: `${word} ${i + 1} reaches outside the deck` });
  });
  s.studs.forEach((st, i) => {
    if (!st) return;
    if (mouth && inside(st.positionMm, mouth)) out.push({ at: `studs.${i}`, message: `stud ${i + 1} is inside the mouth` });
    else if (deck && !inside(st.positionMm, deck)) out.push({ at: `studs.${i}`, message: `stud ${i + 1} is off the deck` });
  });
  return out;
}
