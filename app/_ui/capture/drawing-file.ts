import { DOMParser } from "@xmldom/xmldom";
import bspline from "b-spline";
import DxfParser from "dxf-parser";
import type { IArcEntity, ICircleEntity, IEntity, ILineEntity, ILwpolylineEntity, IPolylineEntity, ISplineEntity } from "dxf-parser";
import svgpath from "svgpath";
import { OutlineSchema, type Outline } from "@/geometry/schema";
import type { CapturedShapes } from "./captured-shapes";

// Reads a deck drawing (DXF or SVG) into closed shapes a person can pick from: the deck, the mouth, the
// passages, the stud holes. Curves become polygons whose vertices lie on the curve and whose chords stray
// from it by no more than the chord tolerance (arcs and bulges exactly so; splines by subdividing until
// the curve's quarter, half and three-quarter points are within it). Whole circles stay circles.

export type DrawingUnit = "mm" | "in";
export const MM_PER_UNIT: Record<DrawingUnit, number> = { mm: 1, in: 25.4 };

/** Files above this are refused before they are read. */
export const MAX_DRAWING_BYTES = 5 * 1024 * 1024;
/** Drawings with more entities or elements than this are refused before they are parsed. */
export const MAX_DRAWING_ENTITIES = 10_000;
export const DEFAULT_CHORD_TOLERANCE_MM = 0.02;
const MAX_OUTLINE_POINTS = 2000;

export type DrawingProblem = "empty" | "too-large" | "too-many-entities" | "malformed" | "no-closed-outline" | "unknown-format";

/** A drawing that cannot give a single closed shape, said in words with what was found. */
export class DrawingFileError extends Error {
  constructor(
    readonly problem: DrawingProblem,
    message: string,
  ) {
    super(message);
    this.name = "DrawingFileError";
  }
}

type P = [number, number];

/** One closed shape of the drawing, in the drawing's own units and axes (y up). */
export type DrawingShape = {
  id: string;
  /** What it was in the file, in words: "closed polyline on layer DECK (8 corners, 4 arcs)". */
  source: string;
  layer: string | null;
  shape: { kind: "circle"; center: P; radius: number } | { kind: "polygon"; points: P[] };
};

export type DrawingRead = {
  format: "dxf" | "svg";
  shapes: DrawingShape[];
  /** What was in the file but is not a closed shape, counted: "3 TEXT", "2 open LINE". */
  notUsed: string[];
  /** The unit the file declares, when it declares one. */
  declaredUnit: DrawingUnit | null;
};

export type ReadOptions = { unit: DrawingUnit; chordToleranceMm?: number };

/** Reads a DXF or SVG by its text (the name only helps tell which). */
export function readDrawing(fileName: string, text: string, options: ReadOptions): DrawingRead {
  const bytes = new TextEncoder().encode(text).length;
  if (bytes > MAX_DRAWING_BYTES) {
    throw new DrawingFileError("too-large", `The file is ${(bytes / 1024 / 1024).toFixed(1)} MB; drawings are limited to ${MAX_DRAWING_BYTES / 1024 / 1024} MB. Export only the deck.`);
  }
  if (text.trim() === "") throw new DrawingFileError("empty", "The file is empty.");
  const toleranceMm = options.chordToleranceMm ?? DEFAULT_CHORD_TOLERANCE_MM;
  if (!(toleranceMm > 0) || toleranceMm > 1) throw new DrawingFileError("malformed", "The chord tolerance must be more than 0 and at most 1 mm.");
  const tolerance = toleranceMm / MM_PER_UNIT[options.unit];
  const looksSvg = /\.svg$/i.test(fileName) || /^\s*(<\?xml[^>]*>\s*)?(<!--[\s\S]*?-->\s*)*(<!DOCTYPE[^>]*>\s*)?<svg[\s>]/i.test(text);
  const looksDxf = /\.dxf$/i.test(fileName) || /^\s*0\s*\r?\n\s*SECTION\s*\r?\n/.test(text);
  if (looksSvg) return readSvg(text, tolerance);
  if (looksDxf) return readDxf(text, tolerance);
  throw new DrawingFileError("unknown-format", "This is neither a DXF nor an SVG drawing (judged by its name and first line).");
}

// ---------------------------------------------------------------- curves

/** Points along a circular arc from angle a0 turning by sweep (radians, + counter-clockwise), ends included. */
function arcPoints(center: P, radius: number, a0: number, sweep: number, tolerance: number): P[] {
  const step = radius > tolerance ? 2 * Math.acos(1 - tolerance / radius) : Math.PI / 2;
  const n = Math.max(1, Math.ceil(Math.abs(sweep) / step - 1e-9));
  const pts: P[] = [];
  for (let i = 0; i <= n; i++) {
    const a = a0 + (sweep * i) / n;
    pts.push([center[0] + radius * Math.cos(a), center[1] + radius * Math.sin(a)]);
  }
  return pts;
}

/** A polyline segment from p to q with a DXF bulge (tan of a quarter of the included angle, + counter-clockwise). */
function bulgePoints(p: P, q: P, bulge: number, tolerance: number): P[] {
  if (Math.abs(bulge) < 1e-12) return [p, q];
  const theta = 4 * Math.atan(bulge);
  const chord = Math.hypot(q[0] - p[0], q[1] - p[1]);
  const radius = chord / (2 * Math.abs(Math.sin(theta / 2)));
  // The centre sits on the chord's perpendicular bisector, at distance r·cos(θ/2) on the bulge's turning side.
  const mid: P = [(p[0] + q[0]) / 2, (p[1] + q[1]) / 2];
  const nx = -(q[1] - p[1]) / chord;
  const ny = (q[0] - p[0]) / chord;
  const offset = radius * Math.cos(theta / 2) * Math.sign(bulge);
  const center: P = [mid[0] + nx * offset, mid[1] + ny * offset];
  const a0 = Math.atan2(p[1] - center[1], p[0] - center[0]);
  const pts = arcPoints(center, radius, a0, theta, tolerance);
  pts[0] = p;
  pts[pts.length - 1] = q;
  return pts;
}

function distToChord(p: P, a: P, b: P): number {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const len = Math.hypot(dx, dy);
  if (len === 0) return Math.hypot(p[0] - a[0], p[1] - a[1]);
  const t = Math.max(0, Math.min(1, ((p[0] - a[0]) * dx + (p[1] - a[1]) * dy) / (len * len)));
  return Math.hypot(p[0] - a[0] - t * dx, p[1] - a[1] - t * dy);
}

/** Flattens a parametric curve on [t0, t1] by halving until the quarter points lie within the tolerance of each chord. */
function flattenCurve(at: (t: number) => P, t0: number, t1: number, tolerance: number, depth = 0): P[] {
  const a = at(t0);
  const b = at(t1);
  const probes = [0.25, 0.5, 0.75].map((f) => at(t0 + (t1 - t0) * f));
  if (depth >= 3 && (probes.every((p) => distToChord(p, a, b) <= tolerance) || depth >= 18)) return [a, b];
  const mid = (t0 + t1) / 2;
  const left = flattenCurve(at, t0, mid, tolerance, depth + 1);
  const right = flattenCurve(at, mid, t1, tolerance, depth + 1);
  return [...left, ...right.slice(1)];
}

/** Cubic Bézier: the control polygon bounds the curve, so halving until it is within the tolerance is a strict bound. */
function cubicPoints(p0: P, p1: P, p2: P, p3: P, tolerance: number, depth = 0): P[] {
  if (depth >= 18 || (distToChord(p1, p0, p3) <= tolerance && distToChord(p2, p0, p3) <= tolerance)) return [p0, p3];
  const m = (a: P, b: P): P => [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2];
  const p01 = m(p0, p1), p12 = m(p1, p2), p23 = m(p2, p3);
  const p012 = m(p01, p12), p123 = m(p12, p23);
  const mid = m(p012, p123);
  return [...cubicPoints(p0, p01, p012, mid, tolerance, depth + 1), ...cubicPoints(mid, p123, p23, p3, tolerance, depth + 1).slice(1)];
}

/** SVG elliptical arc from its endpoint form (SVG 1.1, appendix F.6.5: conversion to centre form), flattened. */
function svgArcPoints(p: P, rxIn: number, ryIn: number, phiDeg: number, largeArc: boolean, sweepFlag: boolean, q: P, tolerance: number): P[] {
  let rx = Math.abs(rxIn);
  let ry = Math.abs(ryIn);
  if (rx === 0 || ry === 0 || (p[0] === q[0] && p[1] === q[1])) return [p, q];
  const phi = (phiDeg * Math.PI) / 180;
  const cos = Math.cos(phi);
  const sin = Math.sin(phi);
  const dx = (p[0] - q[0]) / 2;
  const dy = (p[1] - q[1]) / 2;
  const x1 = cos * dx + sin * dy;
  const y1 = -sin * dx + cos * dy;
  const lambda = (x1 * x1) / (rx * rx) + (y1 * y1) / (ry * ry);
  if (lambda > 1) {
    rx *= Math.sqrt(lambda);
    ry *= Math.sqrt(lambda);
  }
  const num = rx * rx * ry * ry - rx * rx * y1 * y1 - ry * ry * x1 * x1;
  const den = rx * rx * y1 * y1 + ry * ry * x1 * x1;
  const coef = (largeArc === sweepFlag ? -1 : 1) * Math.sqrt(Math.max(0, num / den));
  const cx1 = (coef * rx * y1) / ry;
  const cy1 = (-coef * ry * x1) / rx;
  const cx = cos * cx1 - sin * cy1 + (p[0] + q[0]) / 2;
  const cy = sin * cx1 + cos * cy1 + (p[1] + q[1]) / 2;
  const angle = (ux: number, uy: number, vx: number, vy: number) => Math.atan2(ux * vy - uy * vx, ux * vx + uy * vy);
  const theta1 = angle(1, 0, (x1 - cx1) / rx, (y1 - cy1) / ry);
  let dTheta = angle((x1 - cx1) / rx, (y1 - cy1) / ry, (-x1 - cx1) / rx, (-y1 - cy1) / ry);
  if (!sweepFlag && dTheta > 0) dTheta -= 2 * Math.PI;
  if (sweepFlag && dTheta < 0) dTheta += 2 * Math.PI;
  // The sagitta bound of the larger radius holds for the whole ellipse.
  const step = Math.max(rx, ry) > tolerance ? 2 * Math.acos(1 - tolerance / Math.max(rx, ry)) : Math.PI / 2;
  const n = Math.max(1, Math.ceil(Math.abs(dTheta) / step - 1e-9));
  const pts: P[] = [];
  for (let i = 0; i <= n; i++) {
    const t = theta1 + (dTheta * i) / n;
    pts.push([cx + rx * Math.cos(t) * cos - ry * Math.sin(t) * sin, cy + rx * Math.cos(t) * sin + ry * Math.sin(t) * cos]);
  }
  pts[0] = p;
  pts[n] = q;
  return pts;
}

// ---------------------------------------------------------------- shared helpers

function sizeOf(points: P[]): number {
  let minX = Infinity, minY = Infinity, maxX = -Infinity, maxY = -Infinity;
  for (const [x, y] of points) {
    minX = Math.min(minX, x); minY = Math.min(minY, y); maxX = Math.max(maxX, x); maxY = Math.max(maxY, y);
  }
  return Math.hypot(maxX - minX, maxY - minY);
}

/** Drops repeated points and the closing point that repeats the first. */
function tidyRing(points: P[], eps: number): P[] {
  const out: P[] = [];
  for (const p of points) {
    const last = out[out.length - 1];
    if (!last || Math.hypot(p[0] - last[0], p[1] - last[1]) > eps) out.push(p);
  }
  while (out.length > 1 && Math.hypot(out[0][0] - out[out.length - 1][0], out[0][1] - out[out.length - 1][1]) <= eps) out.pop();
  return out;
}

function counted(counts: Map<string, number>): string[] {
  return [...counts.entries()].map(([what, n]) => `${n} ${what}`);
}

function noClosed(format: string, notUsed: string[]): DrawingFileError {
  const found = notUsed.length ? ` Found: ${notUsed.join(", ")}.` : " It holds no shapes at all.";
  return new DrawingFileError("no-closed-outline", `No closed outline in this ${format} drawing.${found} Draw the deck as a closed polyline or a closed path.`);
}

type Piece = { points: P[]; what: string; layer?: string | null };

/** Joins open pieces (lines, arcs) whose ends meet into closed loops; the rest stay open. */
function joinPieces(pieces: Piece[], eps: number): { loops: Piece[]; open: Piece[] } {
  const left = [...pieces];
  const loops: Piece[] = [];
  const open: Piece[] = [];
  const same = (a: P, b: P) => Math.hypot(a[0] - b[0], a[1] - b[1]) <= eps;
  while (left.length) {
    const first = left.shift()!;
    let chain = [...first.points];
    const parts = [first.what];
    const layers = new Set([first.layer ?? null]);
    let grew = true;
    while (grew && !same(chain[0], chain[chain.length - 1])) {
      grew = false;
      for (let i = 0; i < left.length; i++) {
        const pts = left[i].points;
        const end = chain[chain.length - 1];
        if (same(end, pts[0])) chain = [...chain, ...pts.slice(1)];
        else if (same(end, pts[pts.length - 1])) chain = [...chain, ...[...pts].reverse().slice(1)];
        else continue;
        parts.push(left[i].what);
        layers.add(left[i].layer ?? null);
        left.splice(i, 1);
        grew = true;
        break;
      }
    }
    if (same(chain[0], chain[chain.length - 1]) && tidyRing(chain, eps).length >= 3) {
      const byKind = new Map<string, number>();
      for (const w of parts) byKind.set(w, (byKind.get(w) ?? 0) + 1);
      loops.push({ points: chain, what: `closed loop of ${counted(byKind).join(" and ")}`, layer: layers.size === 1 ? [...layers][0] : null });
    } else {
      // Put back what was joined as one open piece per original part, for the count.
      for (const w of parts) open.push({ points: [], what: w });
    }
  }
  return { loops, open };
}

// ---------------------------------------------------------------- DXF

const DXF_UNITS: Record<number, DrawingUnit> = { 1: "in", 4: "mm" };

/** Counts the entities of the ENTITIES section by walking the file's (group code, value) line pairs. */
function countDxfEntities(text: string): number {
  const lines = text.split(/\r?\n/);
  let inEntities = false;
  let n = 0;
  for (let i = 0; i + 1 < lines.length; i += 2) {
    const code = lines[i].trim();
    const value = lines[i + 1].trim();
    if (code === "2" && value === "ENTITIES") inEntities = true;
    else if (code === "0" && inEntities) {
      if (value === "ENDSEC") break;
      if (value !== "VERTEX" && value !== "SEQEND") n++;
      if (n > MAX_DRAWING_ENTITIES) break;
    }
  }
  return n;
}

function readDxf(text: string, tolerance: number): DrawingRead {
  const n = countDxfEntities(text);
  if (n > MAX_DRAWING_ENTITIES) {
    throw new DrawingFileError("too-many-entities", `The drawing has more than ${MAX_DRAWING_ENTITIES.toLocaleString("en")} entities; export only the deck's outlines.`);
  }
  let dxf: ReturnType<DxfParser["parseSync"]>;
  try {
    dxf = new DxfParser().parseSync(text);
  } catch (error) {
    throw new DrawingFileError("malformed", `The DXF file cannot be read: ${(error as Error).message.slice(0, 200)}.`);
  }
  if (!dxf || !Array.isArray(dxf.entities)) throw new DrawingFileError("malformed", "The DXF file cannot be read: it has no ENTITIES section.");
  const insUnits = typeof dxf.header?.$INSUNITS === "number" ? DXF_UNITS[dxf.header.$INSUNITS] ?? null : null;

  const shapes: DrawingShape[] = [];
  const pieces: Piece[] = [];
  const skipped = new Map<string, number>();
  const skip = (what: string) => skipped.set(what, (skipped.get(what) ?? 0) + 1);
  const layerOf = (e: IEntity) => (e.layer && e.layer !== "0" ? e.layer : null);
  const onLayer = (e: IEntity) => (layerOf(e) ? ` on layer ${e.layer}` : "");
  let seq = 0;
  const add = (e: IEntity, source: string, shape: DrawingShape["shape"]) => shapes.push({ id: `d${++seq}`, source, layer: layerOf(e), shape });

  for (const e of dxf.entities) {
    switch (e.type) {
      case "CIRCLE": {
        const c = e as ICircleEntity;
        add(e, `circle${onLayer(e)}, ⌀ ${round(2 * c.radius)}`, { kind: "circle", center: [c.center.x, c.center.y], radius: c.radius });
        break;
      }
      case "LWPOLYLINE":
      case "POLYLINE": {
        const pl = e as ILwpolylineEntity | IPolylineEntity;
        if ("is3dPolyline" in pl && (pl.is3dPolyline || pl.isPolyfaceMesh || pl.is3dPolygonMesh)) {
          skip("3D POLYLINE (not a flat outline)");
          break;
        }
        const vs = (pl.vertices ?? []).map((v) => ({ p: [v.x, v.y] as P, bulge: (v as { bulge?: number }).bulge ?? 0 }));
        if (vs.length < 2) {
          skip(`${e.type} with fewer than two points`);
          break;
        }
        const first = vs[0].p;
        const last = vs[vs.length - 1].p;
        const closed = pl.shape || (vs.length > 2 && Math.hypot(first[0] - last[0], first[1] - last[1]) <= 1e-9 * Math.max(1, sizeOf(vs.map((v) => v.p))));
        const segs = closed ? vs.length : vs.length - 1;
        const pts: P[] = [];
        let arcs = 0;
        for (let i = 0; i < segs; i++) {
          const a = vs[i];
          const b = vs[(i + 1) % vs.length];
          if (Math.abs(a.bulge) > 1e-12) arcs++;
          const part = bulgePoints(a.p, b.p, a.bulge, tolerance);
          pts.push(...(i === 0 ? part : part.slice(1)));
        }
        if (closed) {
          const ring = tidyRing(pts, 1e-9 * Math.max(1, sizeOf(pts)));
          add(e, `closed polyline${onLayer(e)} (${vs.length} corners${arcs ? `, ${arcs} arcs` : ""})`, { kind: "polygon", points: ring });
        } else {
          pieces.push({ points: pts, what: "open polyline", layer: layerOf(e) });
        }
        break;
      }
      case "LINE": {
        const l = e as ILineEntity;
        if (!l.vertices || l.vertices.length < 2) {
          skip("LINE without two ends");
          break;
        }
        pieces.push({ points: [[l.vertices[0].x, l.vertices[0].y], [l.vertices[1].x, l.vertices[1].y]], what: "LINE", layer: layerOf(e) });
        break;
      }
      case "ARC": {
        const a = e as IArcEntity;
        let sweep = a.endAngle - a.startAngle;
        if (sweep <= 0) sweep += 2 * Math.PI;
        pieces.push({ points: arcPoints([a.center.x, a.center.y], a.radius, a.startAngle, sweep, tolerance), what: "ARC", layer: layerOf(e) });
        break;
      }
      case "ELLIPSE": {
        const el = e as IEntity & { center: { x: number; y: number }; majorAxisEndPoint: { x: number; y: number }; axisRatio: number; startAngle: number; endAngle: number };
        const major = Math.hypot(el.majorAxisEndPoint.x, el.majorAxisEndPoint.y);
        const rot = Math.atan2(el.majorAxisEndPoint.y, el.majorAxisEndPoint.x);
        let sweep = el.endAngle - el.startAngle;
        if (sweep <= 0) sweep += 2 * Math.PI;
        const at = (t: number): P => {
          const x = major * Math.cos(t);
          const y = major * el.axisRatio * Math.sin(t);
          return [el.center.x + x * Math.cos(rot) - y * Math.sin(rot), el.center.y + x * Math.sin(rot) + y * Math.cos(rot)];
        };
        const pts = flattenCurve(at, el.startAngle, el.startAngle + sweep, tolerance);
        if (Math.abs(sweep - 2 * Math.PI) < 1e-9) add(e, `ellipse${onLayer(e)}`, { kind: "polygon", points: tidyRing(pts, 1e-12) });
        else pieces.push({ points: pts, what: "elliptical ARC", layer: layerOf(e) });
        break;
      }
      case "SPLINE": {
        const s = e as ISplineEntity;
        const ctrl = (s.controlPoints ?? []).map((p) => [p.x, p.y] as P);
        if (s.rational) {
          skip("rational SPLINE (weights are not read; export it as a polyline)");
          break;
        }
        if (ctrl.length < 2 || !s.knotValues || s.knotValues.length !== ctrl.length + s.degreeOfSplineCurve + 1) {
          skip("SPLINE without control points and knots (fit points only)");
          break;
        }
        const degree = s.degreeOfSplineCurve;
        const knots = s.knotValues;
        const lo = knots[degree];
        const hi = knots[knots.length - 1 - degree];
        const at = (t: number): P => {
          const v = bspline(Math.min(1, Math.max(0, (t - lo) / (hi - lo))), degree, ctrl, knots) as number[];
          return [v[0], v[1]];
        };
        const breaks = [...new Set(knots.slice(degree, knots.length - degree))];
        const pts: P[] = [];
        for (let i = 0; i + 1 < breaks.length; i++) pts.push(...flattenCurve(at, breaks[i], breaks[i + 1], tolerance).slice(i === 0 ? 0 : 1));
        const closed = s.closed || s.periodic || Math.hypot(pts[0][0] - pts[pts.length - 1][0], pts[0][1] - pts[pts.length - 1][1]) <= 1e-9 * Math.max(1, sizeOf(pts));
        if (closed) add(e, `closed spline${onLayer(e)}`, { kind: "polygon", points: tidyRing(pts, 1e-9 * Math.max(1, sizeOf(pts))) });
        else pieces.push({ points: pts, what: "open SPLINE", layer: layerOf(e) });
        break;
      }
      default:
        skip(e.type);
    }
  }
  const all = pieces.flatMap((p) => p.points);
  const { loops, open } = joinPieces(pieces, 1e-6 * Math.max(1, all.length ? sizeOf(all) : 1));
  for (const loop of loops) {
    shapes.push({ id: `d${++seq}`, source: `${loop.what}${loop.layer ? ` on layer ${loop.layer}` : ""}`, layer: loop.layer ?? null, shape: { kind: "polygon", points: tidyRing(loop.points, 1e-9) } });
  }
  for (const o of open) skip(o.what === "open polyline" ? "open polyline" : `${o.what} not joined into a closed loop`);
  const notUsed = counted(skipped);
  if (shapes.length === 0) throw noClosed("DXF", notUsed);
  return { format: "dxf", shapes, notUsed, declaredUnit: insUnits };
}

// ---------------------------------------------------------------- SVG

const SVG_SHAPES = ["path", "circle", "ellipse", "rect", "polygon", "polyline", "line"];

function num(el: Element, name: string, fallback = 0): number {
  const raw = el.getAttribute(name);
  if (raw == null || raw.trim() === "") return fallback;
  const v = parseFloat(raw);
  return Number.isFinite(v) ? v : fallback;
}

function transformOf(el: Element): string {
  const parts: string[] = [];
  for (let n: Node | null = el; n && n.nodeType === 1; n = n.parentNode) {
    const t = (n as Element).getAttribute("transform");
    if (t) parts.unshift(t);
  }
  return parts.join(" ");
}

function pathDataOf(el: Element): string | null {
  switch (el.tagName.toLowerCase()) {
    case "path":
      return el.getAttribute("d");
    case "rect": {
      const x = num(el, "x"), y = num(el, "y"), w = num(el, "width"), h = num(el, "height");
      if (!(w > 0 && h > 0)) return null;
      let rx = num(el, "rx", NaN), ry = num(el, "ry", NaN);
      if (Number.isNaN(rx)) rx = Number.isNaN(ry) ? 0 : ry;
      if (Number.isNaN(ry)) ry = rx;
      rx = Math.min(rx, w / 2);
      ry = Math.min(ry, h / 2);
      if (rx <= 0 || ry <= 0) return `M${x} ${y}H${x + w}V${y + h}H${x}Z`;
      return `M${x + rx} ${y}H${x + w - rx}A${rx} ${ry} 0 0 1 ${x + w} ${y + ry}V${y + h - ry}A${rx} ${ry} 0 0 1 ${x + w - rx} ${y + h}H${x + rx}A${rx} ${ry} 0 0 1 ${x} ${y + h - ry}V${y + ry}A${rx} ${ry} 0 0 1 ${x + rx} ${y}Z`;
    }
    case "circle":
    case "ellipse": {
      const cx = num(el, "cx"), cy = num(el, "cy");
      const rx = el.tagName === "circle" ? num(el, "r") : num(el, "rx");
      const ry = el.tagName === "circle" ? rx : num(el, "ry");
      if (!(rx > 0 && ry > 0)) return null;
      return `M${cx - rx} ${cy}A${rx} ${ry} 0 1 0 ${cx + rx} ${cy}A${rx} ${ry} 0 1 0 ${cx - rx} ${cy}Z`;
    }
    case "polygon":
    case "polyline": {
      const pts = (el.getAttribute("points") ?? "").trim();
      if (!pts) return null;
      return `M${pts}${el.tagName === "polygon" ? "Z" : ""}`;
    }
    case "line":
      return `M${num(el, "x1")} ${num(el, "y1")}L${num(el, "x2")} ${num(el, "y2")}`;
  }
  return null;
}

/** Subpaths of a path as point lists (y still down), each marked closed or open. */
function flattenPath(d: string, transform: string, tolerance: number): { points: P[]; closed: boolean }[] {
  let p = svgpath(d);
  if (transform) p = p.transform(transform);
  p = p.abs().unshort();
  const out: { points: P[]; closed: boolean }[] = [];
  let cur: P = [0, 0];
  let start: P = [0, 0];
  let pts: P[] = [];
  const flush = (closed: boolean) => {
    if (pts.length > 1) out.push({ points: pts, closed });
    pts = [];
  };
  p.iterate((seg) => {
    const cmd = seg[0] as string;
    const v = seg.slice(1) as number[];
    switch (cmd) {
      case "M":
        flush(false);
        cur = [v[0], v[1]];
        start = cur;
        pts = [cur];
        break;
      case "L":
        cur = [v[0], v[1]];
        pts.push(cur);
        break;
      case "H":
        cur = [v[0], cur[1]];
        pts.push(cur);
        break;
      case "V":
        cur = [cur[0], v[0]];
        pts.push(cur);
        break;
      case "C": {
        const to: P = [v[4], v[5]];
        pts.push(...cubicPoints(cur, [v[0], v[1]], [v[2], v[3]], to, tolerance).slice(1));
        cur = to;
        break;
      }
      case "Q": {
        // A quadratic is the cubic with control points two thirds of the way to its one control point.
        const c: P = [v[0], v[1]];
        const to: P = [v[2], v[3]];
        const c1: P = [cur[0] + (2 / 3) * (c[0] - cur[0]), cur[1] + (2 / 3) * (c[1] - cur[1])];
        const c2: P = [to[0] + (2 / 3) * (c[0] - to[0]), to[1] + (2 / 3) * (c[1] - to[1])];
        pts.push(...cubicPoints(cur, c1, c2, to, tolerance).slice(1));
        cur = to;
        break;
      }
      case "A": {
        const to: P = [v[5], v[6]];
        pts.push(...svgArcPoints(cur, v[0], v[1], v[2], v[3] !== 0, v[4] !== 0, to, tolerance).slice(1));
        cur = to;
        break;
      }
      case "Z":
        pts.push(start);
        flush(true);
        cur = start;
        pts = [cur];
        break;
    }
  });
  flush(false);
  return out;
}

function svgDeclaredUnit(svg: Element): DrawingUnit | null {
  const width = svg.getAttribute("width") ?? "";
  const m = /^\s*([\d.]+)\s*(mm|in)\s*$/.exec(width);
  const vb = (svg.getAttribute("viewBox") ?? "").trim().split(/[\s,]+/).map(Number);
  if (!m) return null;
  // The declared unit is one user unit only when the viewBox is as wide as the width says (or absent).
  if (vb.length === 4 && Math.abs(vb[2] - parseFloat(m[1])) > 1e-9 * Math.max(1, vb[2])) return null;
  return m[2] as DrawingUnit;
}

function readSvg(text: string, tolerance: number): DrawingRead {
  const elements = (text.match(/<(path|circle|ellipse|rect|polygon|polyline|line)[\s/>]/g) ?? []).length;
  if (elements > MAX_DRAWING_ENTITIES) {
    throw new DrawingFileError("too-many-entities", `The drawing has more than ${MAX_DRAWING_ENTITIES.toLocaleString("en")} shapes; export only the deck's outlines.`);
  }
  const errors: string[] = [];
  let doc: Document;
  try {
    doc = new DOMParser({
      onError: (level: string, msg: string) => {
        if (level !== "warning") errors.push(msg);
      },
    }).parseFromString(text, "image/svg+xml") as unknown as Document;
  } catch (error) {
    throw new DrawingFileError("malformed", `The SVG file cannot be read: ${String((error as Error).message ?? error).split("\n")[0].slice(0, 200)}.`);
  }
  const svg = doc?.documentElement;
  if (errors.length || !svg || svg.tagName.toLowerCase() !== "svg") {
    throw new DrawingFileError("malformed", `The SVG file cannot be read${errors.length ? `: ${errors[0].split("\n")[0].slice(0, 200)}` : ": it has no <svg> element"}.`);
  }
  const shapes: DrawingShape[] = [];
  const skipped = new Map<string, number>();
  const skip = (what: string) => skipped.set(what, (skipped.get(what) ?? 0) + 1);
  let seq = 0;
  for (const tag of SVG_SHAPES) {
    const list = svg.getElementsByTagName(tag);
    for (let i = 0; i < list.length; i++) {
      const el = list.item(i)!;
      const idAttr = el.getAttribute("id");
      const label = `${tag}${idAttr ? ` "${idAttr}"` : ""}`;
      const transform = transformOf(el);
      // A circle drawn without a transform (or with a plain move) stays an exact circle.
      if (tag === "circle" && (!transform || /^\s*(translate\([^)]*\)\s*)*$/.test(transform))) {
        const r = num(el, "r");
        if (!(r > 0)) {
          skip(`${tag} with no radius`);
          continue;
        }
        const moved = flattenPath(`M${num(el, "cx")} ${num(el, "cy")}h0`, transform, tolerance)[0]?.points[0] ?? [num(el, "cx"), num(el, "cy")];
        shapes.push({ id: `s${++seq}`, source: `circle${idAttr ? ` "${idAttr}"` : ""}, ⌀ ${round(2 * r)}`, layer: idAttr, shape: { kind: "circle", center: [moved[0], -moved[1]], radius: r } });
        continue;
      }
      const d = pathDataOf(el);
      if (!d) {
        skip(`${tag} with no size`);
        continue;
      }
      let subpaths: { points: P[]; closed: boolean }[];
      try {
        subpaths = flattenPath(d, transform, tolerance);
      } catch {
        skip(`${tag} with unreadable path data`);
        continue;
      }
      subpaths.forEach((sp, k) => {
        const ring = tidyRing(sp.points, 1e-9 * Math.max(1, sizeOf(sp.points)));
        if (!sp.closed || ring.length < 3) {
          skip(`open ${tag}`);
          return;
        }
        shapes.push({
          id: `s${++seq}`,
          source: `closed ${label}${subpaths.length > 1 ? ` (part ${k + 1})` : ""}, ${ring.length} points`,
          layer: idAttr,
          shape: { kind: "polygon", points: ring.map(([x, y]) => [x, -y] as P) },
        });
      });
    }
  }
  for (const other of ["text", "image", "use"]) {
    const n = svg.getElementsByTagName(other).length;
    if (n) skipped.set(other, n);
  }
  const notUsed = counted(skipped);
  if (shapes.length === 0) throw noClosed("SVG", notUsed);
  return { format: "svg", shapes, notUsed, declaredUnit: svgDeclaredUnit(svg) };
}

function round(v: number): string {
  return String(Number(v.toFixed(3)));
}

// ---------------------------------------------------------------- to the case's shapes

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
