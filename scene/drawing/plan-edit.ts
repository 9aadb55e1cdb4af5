import type { LengthUnits, Vec2 } from "@/geometry";
import type { ShapeIssue, ShapeOutline } from "@/geometry/shapes";
import { diameterLabel, lengthLabel } from "@/model/units";
import { bounds, outlineRing } from "../outline";
import { deckLayer, flip, mouthLayer, path, pocketLayer, studHoleLayer } from "./plan";
import { INK, el, hdim, n, sheet, text, vdim, type Drawing } from "./svg";

// The plan at the deck of a profile being entered: the same layers as the study's plan, with a handle
// on every corner, stud and circle edge, named by data-key so the form can find what was touched.
// Keys: a shape is "deck", "mouth", "pockets.1", "studs.2"; a corner "deck:3"; a circle's edge
// "mouth:edge"; the edge after corner 3 "deck~3". A handle's centre (cx, −cy) is its point in mm.

/** The drawing's viewBox, in drawing coordinates (y down). */
export type Frame = { minX: number; minY: number; maxX: number; maxY: number };

/** The shapes as far as they can be read; what cannot be read yet is null and left out. */
export interface EditShapes {
  deck: ShapeOutline | null;
  mouth: ShapeOutline | null;
  studs: readonly ({ label: string; positionMm: [number, number] } | null)[];
  studHoleDiameterMm: number | null;
  pockets: readonly { label: string; outline: ShapeOutline | null; startDepthMm: number }[];
}

export interface EditOptions {
  units: LengthUnits;
  /** The key under the pointer or in a focused field. */
  highlight?: string | null;
  /** The point picked for the arrow keys. */
  selected?: string | null;
  issues?: readonly ShapeIssue[];
  /** Keeps the view still (during a drag); computed from the shapes when absent. */
  frame?: Frame | null;
  /** What the shapes are called ("deck", "mouth", "passage", …): the kit's gasket names them differently. */
  words?: { deck: string; mouth: string; pocket: string };
  title?: string;
  /** A point is being dragged: the edges are not offered for clicking meanwhile (fewer elements to redraw). */
  dragging?: boolean;
  /** Circles whose diameter is not dragged (a mouth whose diameter comes from its readings). */
  fixedCircles?: readonly string[];
  /** Studs drawn without handles (a kit's studs, entered in their own list). */
  fixedStuds?: boolean;
}

const WORDS = { deck: "deck", mouth: "mouth", pocket: "passage" };

/** Whether `key` is the shape `shape` or one of its points. */
const within = (key: string | null | undefined, shape: string) => !!key && (key === shape || key.startsWith(`${shape}:`) || key.startsWith(`${shape}~`));

/** The frame that shows every shape with room for the dimensions around it. */
export function frameOf(s: EditShapes): Frame {
  const rings: Vec2[][] = [];
  if (s.deck) rings.push(outlineRing(s.deck));
  if (s.mouth) rings.push(outlineRing(s.mouth));
  for (const p of s.pockets) if (p.outline) rings.push(outlineRing(p.outline));
  const studs = s.studs.filter((x) => x !== null).map((x) => x.positionMm);
  if (studs.length) rings.push(studs);
  const b = rings.length ? bounds(rings) : { minX: -50, minY: -50, maxX: 50, maxY: 50 };
  const size = Math.max(40, b.maxX - b.minX, b.maxY - b.minY);
  const m = size * 0.18;
  return { minX: Math.min(b.minX, 0) - m, maxX: Math.max(b.maxX, 0) + m * 1.6, minY: -Math.max(b.maxY, 0) - m, maxY: -Math.min(b.minY, 0) + m };
}

/** The drawing's parts in the order they are stacked: the shapes and labels, the clickable edges, the handles, the problems. */
type Layers = { body: string[]; edges: string[]; handles: string[]; notes: string[] };

/** What every step of the editable plan draws with: the options, the frame, the text and handle sizes, the problems by key. */
interface Pen {
  readonly o: EditOptions;
  readonly f: Frame;
  /** Text size and handle radius, in mm, from the frame's size. */
  readonly fs: number;
  readonly hr: number;
  readonly words: { deck: string; mouth: string; pocket: string };
  /** The first problem of each key. */
  readonly bad: ReadonlyMap<string, string>;
  readonly out: Layers;
}

function penFor(s: EditShapes, o: EditOptions): Pen {
  const f = o.frame ?? frameOf(s);
  const w = f.maxX - f.minX, h = f.maxY - f.minY;
  const bad = new Map<string, string>();
  for (const i of o.issues ?? []) if (!bad.has(i.at)) bad.set(i.at, i.message);
  return {
    o,
    f,
    fs: Math.max(2.2, Math.min(w, h) / 40),
    hr: Math.max(0.8, Math.min(w, h) / 110),
    words: o.words ?? WORDS,
    bad,
    out: { body: [], edges: [], handles: [], notes: [] },
  };
}

/** The stroke of a shape: red with a problem, the accent while it or one of its points is highlighted. */
const mark = (pen: Pen, key: string) =>
  pen.bad.has(key) ? { stroke: INK.interfere, "stroke-width": 0.6 } : within(pen.o.highlight, key) ? { stroke: INK.accent, "stroke-width": 0.6 } : {};

/** A point's accessible name: what it is and where, in the reader's units. */
const pointName = (label: string, at: Vec2, units: LengthUnits) => `${label}: x ${lengthLabel(at[0], units)}, y ${lengthLabel(at[1], units)}`;

/** Origin and axes (the cylinder axis at the deck; x right, y up). */
function drawAxes({ f, fs, out }: Pen) {
  out.body.push(el("path", { d: `M${n(f.minX)} 0H${n(f.maxX)}M0 ${n(f.minY)}V${n(f.maxY)}`, stroke: INK.ink3, "stroke-width": 0.15, "stroke-dasharray": "3 1.5" }));
  out.body.push(text(f.maxX - fs * 0.6, -fs * 0.4, "x", fs, { "text-anchor": "end", fill: INK.ink2 }));
  out.body.push(text(fs * 0.4, f.minY + fs * 1.2, "y", fs, { fill: INK.ink2 }));
}

/** The problem of `key` in words, at `at`. */
function drawNote(pen: Pen, key: string, at: Vec2) {
  const msg = pen.bad.get(key);
  if (msg) pen.out.notes.push(text(at[0], at[1], msg, pen.fs * 0.85, { fill: INK.interfere, "data-issue": key }));
}

/** A handle: a focusable circle named by its point, larger and filled while highlighted or picked. */
function drawPoint({ o, hr, bad, out }: Pen, key: string, kind: string, at: Vec2, label: string) {
  const [x, y] = flip(at);
  const on = o.highlight === key || o.selected === key;
  out.handles.push(
    el("circle", {
      cx: x,
      cy: y,
      r: on ? hr * 1.4 : hr,
      fill: on ? INK.accent : "#ffffff",
      stroke: bad.has(key.split(":")[0]) ? INK.interfere : INK.accent,
      "stroke-width": hr * 0.35,
      tabindex: 0,
      role: "button",
      "aria-roledescription": "movable point",
      "aria-label": pointName(label, at, o.units),
      "aria-pressed": o.selected === key ? "true" : undefined,
      "data-key": key,
      "data-kind": kind,
    }),
  );
}

/** The handles of an outline: a circle's edge (unless its diameter is fixed), or every corner with the edge after it. */
function drawOutlineHandles(pen: Pen, key: string, word: string, out: ShapeOutline) {
  const { o, hr } = pen;
  if (out.kind === "circle") {
    if (o.fixedCircles?.includes(key)) return;
    const c = out.centerMm ?? [0, 0];
    drawPoint(pen, `${key}:edge`, "radius", [c[0] + out.diameterMm / 2, c[1]], `${word} edge (diameter ${diameterLabel(out.diameterMm, o.units)})`);
    return;
  }
  const pts = out.pointsMm;
  pts.forEach((p, i) => {
    const q = pts[(i + 1) % pts.length];
    const [x1, y1] = flip(p), [x2, y2] = flip(q);
    if (!o.dragging) pen.out.edges.push(el("line", { x1, y1, x2, y2, stroke: "transparent", "stroke-width": hr * 2, "data-key": `${key}~${i}`, "data-kind": "edge" }));
    drawPoint(pen, `${key}:${i}`, "corner", p, `${word} corner ${i + 1}`);
  });
}

/** Where a shape's problem is written: beside its top right corner. */
function topRight(fs: number, out: ShapeOutline): Vec2 {
  const b = bounds([outlineRing(out)]);
  return [b.maxX + fs * 0.5, -b.maxY - fs * 0.4];
}

/** The deck with its handles, its problem and its width and length dimensioned. */
function drawDeck(pen: Pen, deck: ShapeOutline) {
  const { o, fs, out } = pen;
  const ring = outlineRing(deck);
  out.body.push(deckLayer(ring, { "data-key": "deck", ...mark(pen, "deck") }));
  drawOutlineHandles(pen, "deck", pen.words.deck, deck);
  drawNote(pen, "deck", topRight(fs, deck));
  const b = bounds([ring]);
  out.body.push(hdim(b.minX, b.maxX, -b.maxY - fs * 2.2, -b.maxY, -b.maxY, lengthLabel(b.maxX - b.minX, o.units), fs * 0.9));
  out.body.push(vdim(b.maxX + fs * 2.2, -b.maxY, -b.minY, b.maxX, lengthLabel(b.maxY - b.minY, o.units), fs * 0.9));
}

/** Each pocket that can be read, with its handles, its name in its middle and its problem. */
function drawPockets(pen: Pen, pockets: EditShapes["pockets"]) {
  const { fs, words, out } = pen;
  pockets.forEach((p, i) => {
    if (!p.outline) return;
    const key = `pockets.${i}`;
    out.body.push(pocketLayer(outlineRing(p.outline), p.startDepthMm, { "data-key": key, ...mark(pen, key) }));
    drawOutlineHandles(pen, key, `${words.pocket} ${i + 1}`, p.outline);
    const b = bounds([outlineRing(p.outline)]);
    out.body.push(text((b.minX + b.maxX) / 2, -(b.minY + b.maxY) / 2 + fs * 0.3, p.label || `${words.pocket} ${i + 1}`, fs * 0.75, { "text-anchor": "middle", fill: INK.ink2 }));
    drawNote(pen, key, topRight(fs, p.outline));
  });
}

/** The mouth with its handles, a round mouth's diameter written inside it, and its problem. */
function drawMouth(pen: Pen, mouth: ShapeOutline) {
  const { o, fs, words, out } = pen;
  out.body.push(mouthLayer(outlineRing(mouth), { "data-key": "mouth", ...mark(pen, "mouth") }));
  drawOutlineHandles(pen, "mouth", words.mouth, mouth);
  if (mouth.kind === "circle") out.body.push(text(mouth.centerMm?.[0] ?? 0, -(mouth.centerMm?.[1] ?? 0) + mouth.diameterMm / 4, `${words.mouth} ${diameterLabel(mouth.diameterMm, o.units)}`, fs * 0.85, { "text-anchor": "middle", fill: INK.ink2 }));
  drawNote(pen, "mouth", topRight(fs, mouth));
}

/** Each stud that can be read, labelled, with its handle and problem; the pattern's spans dimensioned. */
function drawStuds(pen: Pen, s: EditShapes) {
  const { o, fs, hr, bad, out } = pen;
  const hole = (s.studHoleDiameterMm ?? 0) > 0 ? (s.studHoleDiameterMm as number) / 2 : hr * 2;
  const studs = s.studs.map((st, i) => [st, i] as const).filter((x): x is readonly [{ label: string; positionMm: [number, number] }, number] => x[0] !== null);
  for (const [st, i] of studs) {
    const key = `studs.${i}`;
    out.body.push(studHoleLayer(st.positionMm, hole, { "data-key": key, ...mark(pen, key) }));
    out.body.push(text(st.positionMm[0] + hole + fs * 0.3, -st.positionMm[1] - hole - fs * 0.2, st.label || `stud ${i + 1}`, fs * 0.8, { fill: bad.has(key) ? INK.interfere : INK.ink2 }));
    if (!o.fixedStuds) drawPoint(pen, key, "stud", st.positionMm, `stud ${st.label || i + 1}`);
    drawNote(pen, key, [st.positionMm[0] + hole + fs * 0.3, -st.positionMm[1] + hole + fs]);
  }
  if (studs.length > 1) {
    const xs = studs.map(([st]) => st.positionMm[0]), ys = studs.map(([st]) => st.positionMm[1]);
    const x0 = Math.min(...xs), x1 = Math.max(...xs), y0 = Math.min(...ys), y1 = Math.max(...ys);
    if (x1 - x0 > 1) out.body.push(hdim(x0, x1, -y0 + fs * 2.4, -y0, -y0, `studs ${lengthLabel(x1 - x0, o.units)}`, fs * 0.85, INK.ink2));
    if (y1 - y0 > 1) out.body.push(vdim(x0 - fs * 2.4, -y1, -y0, x0, lengthLabel(y1 - y0, o.units), fs * 0.85, INK.ink2));
  }
}

/** The editable plan of a profile's shapes, with its frame. */
export function editDrawing(s: EditShapes, o: EditOptions): Drawing & { frame: Frame } {
  const pen = penFor(s, o);
  const { f, hr, out } = pen;
  drawAxes(pen);
  if (s.deck) drawDeck(pen, s.deck);
  drawPockets(pen, s.pockets);
  if (s.mouth) drawMouth(pen, s.mouth);
  drawStuds(pen, s);
  out.body.push(el("circle", { cx: 0, cy: 0, r: hr * 0.6, fill: INK.ink2 }));
  const markup = out.body.join("") + out.edges.join("") + out.handles.join("") + out.notes.join("");
  const d = sheet(o.title ?? "Plan at the deck, as entered", f.minX, f.minY, f.maxX - f.minX, f.maxY - f.minY, markup, "group");
  return { ...d, frame: f };
}

/** A change of one element of the drawn plan: the handle of a point, the shape it belongs to, or a stud hole's centre cross. */
export type DragPatch = { key: string; part: "handle" | "shape" | "cross"; attrs: Record<string, string> };

/**
 * What changes in the drawing while the point `key` is dragged to `atMm` (already snapped): only the
 * dragged handle and the outline (or stud hole) it belongs to, so a drag redraws two elements rather than
 * the whole plan. The labels and dimensions follow when the drag is released and the plan is drawn again.
 */
export function dragPatch(s: EditShapes, key: string, atMm: Vec2, units: LengthUnits, words = WORDS): DragPatch[] {
  const [hx, hy] = flip(atMm);
  const handle = (label: string, at: Vec2): DragPatch => ({
    key,
    part: "handle",
    attrs: { cx: n(flip(at)[0]), cy: n(flip(at)[1]), "aria-label": pointName(label, at, units) },
  });
  const stud = /^studs\.(\d+)$/.exec(key);
  if (stud) {
    const st = s.studs[Number(stud[1])];
    if (!st) return [];
    const r = (s.studHoleDiameterMm ?? 0) / 2;
    const out: DragPatch[] = [
      handle(`stud ${st.label || Number(stud[1]) + 1}`, atMm),
      { key, part: "shape", attrs: { cx: n(hx), cy: n(hy) } },
    ];
    if (r > 0) out.push({ key, part: "cross", attrs: { d: `M${hx - r - 1} ${hy}H${hx + r + 1}M${hx} ${hy - r - 1}V${hy + r + 1}` } });
    return out;
  }
  const m = /^(deck|mouth|pockets\.(\d+)):(\d+|edge)$/.exec(key);
  if (!m) return [];
  const shape = m[1];
  const pocket = m[2] === undefined ? null : Number(m[2]);
  const outline = shape === "deck" ? s.deck : shape === "mouth" ? s.mouth : (s.pockets[pocket ?? -1]?.outline ?? null);
  if (!outline) return [];
  const word = shape === "deck" ? words.deck : shape === "mouth" ? words.mouth : `${words.pocket} ${(pocket ?? 0) + 1}`;
  if (m[3] === "edge") {
    if (outline.kind !== "circle") return [];
    const c = outline.centerMm ?? [0, 0];
    const d = 2 * Math.hypot(atMm[0] - c[0], atMm[1] - c[1]);
    if (!(d > 0)) return [];
    const moved = { ...outline, diameterMm: d };
    return [
      handle(`${word} edge (diameter ${diameterLabel(d, units)})`, [c[0] + d / 2, c[1]]),
      { key: shape, part: "shape", attrs: { d: path(outlineRing(moved)) } },
    ];
  }
  if (outline.kind !== "polygon") return [];
  const i = Number(m[3]);
  if (i >= outline.pointsMm.length) return [];
  const moved = { ...outline, pointsMm: outline.pointsMm.map((p, j): Vec2 => (j === i ? [atMm[0], atMm[1]] : p)) };
  return [handle(`${word} corner ${i + 1}`, atMm), { key: shape, part: "shape", attrs: { d: path(outlineRing(moved)) } }];
}
