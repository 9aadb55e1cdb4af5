import { OutlineSchema, type Outline } from "@/geometry/schema";
import { pxToMm, type PhotoToMm, type Point } from "@/geometry/homography";
import type { CapturedShapes } from "./captured-shapes";
import { circleThrough } from "./photo-file";

// The points clicked on a photo, turned into the case's shapes in mm through the photo's reference.

/** What the traced shapes are called: a case's deck, or a kit's base gasket. */
export const TRACE_WORDS = {
  case: { deck: "Deck", mouth: "Mouth", passage: "Passage", passages: "passages" },
  gasket: { deck: "Gasket outline", mouth: "Bore", passage: "Port", passages: "ports" },
} as const;
export type TraceWords = (typeof TRACE_WORDS)[keyof typeof TRACE_WORDS];
export type ShapesFor = keyof typeof TRACE_WORDS;

/** The points clicked for each shape, in the photo's pixels. */
export type TracedPoints = { studs: Point[]; deck: Point[]; mouth: Point[]; mouthRound: boolean; passages: Point[][] };

export type Traced = { shapes: CapturedShapes; problems: string[]; deckBad: boolean; mouthBad: boolean; passageBad: boolean[] };

type Piece = { outline?: Outline; problem?: string };

/** The traced shapes in mm (to 0.001 mm), with what is wrong with any of them in words. */
export function tracedShapes(map: PhotoToMm, pts: TracedPoints, extraStuds: readonly Point[], shapesFor: ShapesFor): Traced {
  const words = TRACE_WORDS[shapesFor];
  const mm = (p: Point): [number, number] => {
    const [x, y] = pxToMm(map, p);
    return [Math.round(x * 1000) / 1000, Math.round(y * 1000) / 1000];
  };
  const polygon = (ring: Point[], what: string): Piece => {
    if (ring.length === 0) return {};
    if (ring.length < 3) return { problem: `The ${what} needs at least three corners (${ring.length} so far).` };
    const parsed = OutlineSchema.safeParse({ kind: "polygon", pointsMm: ring.map(mm) });
    return parsed.success ? { outline: parsed.data } : { problem: `The ${what}: ${parsed.error.issues[0]?.message ?? "not a valid outline"}.` };
  };
  const round = (ring: Point[], what: string): Piece => {
    if (ring.length === 0) return {};
    if (ring.length < 3) return { problem: `Click three points on the ${what}'s edge (${ring.length} so far).` };
    const c = circleThrough(mm(ring[0]), mm(ring[1]), mm(ring[2]));
    return c ? { outline: { kind: "circle", diameterMm: Math.round(c.diameterMm * 1000) / 1000, centerMm: c.centerMm } } : { problem: `The three ${what} points lie on one line; click them spread around the edge.` };
  };
  const studs = [...extraStuds, ...pts.studs].map((p, i) => ({ label: `S${i + 1}`, positionMm: mm(p) }));
  const deck = polygon(pts.deck, words.deck.toLowerCase());
  const mouth = pts.mouthRound ? round(pts.mouth, words.mouth.toLowerCase()) : polygon(pts.mouth, words.mouth.toLowerCase());
  const passages = pts.passages.map((p, i) => ({ label: `${words.passage} ${i + 1}`, ...polygon(p, `${words.passage.toLowerCase()} ${i + 1}`) }));
  const problems = [deck.problem, mouth.problem, ...passages.map((p) => p.problem)].filter((p): p is string => Boolean(p));
  const shapes: CapturedShapes = {};
  if (deck.outline) shapes.deck = deck.outline;
  if (mouth.outline) shapes.mouth = mouth.outline;
  if (studs.length) shapes.studs = studs;
  const windows = passages.flatMap((p) => (p.outline ? [{ label: p.label, outline: p.outline }] : []));
  if (windows.length) shapes[shapesFor === "gasket" ? "ports" : "pockets"] = windows;
  return { shapes, problems, deckBad: Boolean(deck.problem), mouthBad: Boolean(mouth.problem), passageBad: passages.map((p) => Boolean(p.problem)) };
}

/** What was put into the form, in words ("the deck, 4 studs"). */
export function appliedWords(shapes: CapturedShapes, words: TraceWords): string {
  const windows = shapes.pockets ?? shapes.ports;
  const parts = [shapes.deck ? `the ${words.deck.toLowerCase()}` : null, shapes.mouth ? `the ${words.mouth.toLowerCase()}` : null, shapes.studs ? `${shapes.studs.length} studs` : null, windows ? `${windows.length} ${words.passages}` : null];
  return `Put into the form: ${parts.filter(Boolean).join(", ")}.`;
}
