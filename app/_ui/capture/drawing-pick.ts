import { OutlineSchema, type Outline } from "@/geometry/schema";
import type { CapturedShapes } from "./captured-shapes";
import { type DrawingUnit, MM_PER_UNIT, MAX_OUTLINE_POINTS, type P, type DrawingShape, type DrawingRead } from "./drawing-types";

// The shapes a person picked from a drawing, turned into the case's shapes in millimetres.

export type ShapeRole = "deck" | "mouth" | "passage" | "stud" | "port" | "unused";

export type PickOptions = {
  unit: DrawingUnit;
  /** Where the cylinder axis is: the drawing's own origin, or the mouth's centre. */
  origin: "drawing" | "mouth";
};

/** The centre of a shape: a circle's centre, a polygon's area centroid. */
export function centreOf(shape: DrawingShape["shape"]): P {
  if (shape.kind === "circle") return shape.center;
  let a = 0, cx = 0, cy = 0;
  const pts = shape.points;
  for (let i = 0; i < pts.length; i++) {
    const [x0, y0] = pts[i];
    const [x1, y1] = pts[(i + 1) % pts.length];
    const c = x0 * y1 - x1 * y0;
    a += c;
    cx += (x0 + x1) * c;
    cy += (y0 + y1) * c;
  }
  return [cx / (3 * a), cy / (3 * a)];
}

export type PickResult = { shapes: CapturedShapes; problems: string[] };

/** Turns the picked shapes into the case's shapes in mm, checked by the core's own outline rules. */
export function pickShapes(read: DrawingRead, roles: Record<string, ShapeRole>, options: PickOptions): PickResult {
  const k = MM_PER_UNIT[options.unit];
  const problems: string[] = [];
  const byRole = (role: ShapeRole) => read.shapes.filter((s) => roles[s.id] === role);
  const decks = byRole("deck");
  const mouths = byRole("mouth");
  if (decks.length > 1) problems.push(`${decks.length} shapes are marked as the deck; mark one.`);
  if (mouths.length > 1) problems.push(`${mouths.length} shapes are marked as the mouth; mark one.`);
  const origin: P = options.origin === "mouth" && mouths[0] ? centreOf(mouths[0].shape) : [0, 0];
  const toMm = (p: P): [number, number] => [(p[0] - origin[0]) * k, (p[1] - origin[1]) * k];
  const outlineOf = (s: DrawingShape, what: string): Outline | undefined => {
    const candidate =
      s.shape.kind === "circle"
        ? { kind: "circle" as const, diameterMm: 2 * s.shape.radius * k, centerMm: toMm(s.shape.center) }
        : { kind: "polygon" as const, pointsMm: s.shape.points.map(toMm) };
    if (candidate.kind === "polygon" && candidate.pointsMm.length > MAX_OUTLINE_POINTS) {
      problems.push(`The ${what} (${s.source}) has ${candidate.pointsMm.length} points after flattening; at most ${MAX_OUTLINE_POINTS}. Choose a coarser chord tolerance.`);
      return undefined;
    }
    const parsed = OutlineSchema.safeParse(candidate);
    if (!parsed.success) {
      problems.push(`The ${what} (${s.source}): ${parsed.error.issues[0]?.message ?? "not a valid outline"}.`);
      return undefined;
    }
    return parsed.data;
  };
  const shapes: CapturedShapes = {};
  if (decks[0]) shapes.deck = outlineOf(decks[0], "deck");
  if (mouths[0]) shapes.mouth = outlineOf(mouths[0], "mouth");
  const passages = byRole("passage").map((s, i) => ({ label: `Passage ${i + 1}`, outline: outlineOf(s, `passage ${i + 1}`) }));
  if (passages.length) shapes.pockets = passages.filter((p): p is { label: string; outline: Outline } => Boolean(p.outline));
  const ports = byRole("port").map((s, i) => ({ label: `Port ${i + 1}`, outline: outlineOf(s, `port ${i + 1}`) }));
  if (ports.length) shapes.ports = ports.filter((p): p is { label: string; outline: Outline } => Boolean(p.outline));
  const studs = byRole("stud");
  if (studs.length) shapes.studs = studs.map((s, i) => ({ label: `S${i + 1}`, positionMm: toMm(centreOf(s.shape)) }));
  if (!decks.length && !mouths.length && !passages.length && !studs.length && !ports.length) problems.push("Mark at least one shape: the deck, the mouth, a passage or a stud hole.");
  return { shapes, problems };
}
