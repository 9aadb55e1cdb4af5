import bspline from "b-spline";
import DxfParser from "dxf-parser";
import type { IArcEntity, ICircleEntity, IEntity, ILineEntity, ILwpolylineEntity, IPolylineEntity, ISplineEntity } from "dxf-parser";
import { arcPoints, bulgePoints, counted, flattenCurve, joinPieces, noClosed, round, sizeOf, tidyRing, type Piece } from "./drawing-curves";
import { type DrawingUnit, MAX_DRAWING_ENTITIES, DrawingFileError, type P, type DrawingShape, type DrawingRead } from "./drawing-types";

// A DXF drawing's closed shapes: circles, closed polylines (with bulges), closed splines, and lines and arcs that join into loops.

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

/** Where each entity's reading goes: a closed shape, a piece to join with others into loops, or a note of what was not used. */
type Sink = {
  tolerance: number;
  add: (e: IEntity, source: string, shape: DrawingShape["shape"]) => void;
  piece: (e: IEntity, points: P[], what: string) => void;
  skip: (what: string) => void;
};

const layerOf = (e: IEntity) => (e.layer && e.layer !== "0" ? e.layer : null);
const onLayer = (e: IEntity) => (layerOf(e) ? ` on layer ${e.layer}` : "");
/** Whether a run of points ends where it starts, to within a billionth of its size. */
const endsMeet = (pts: P[]) => Math.hypot(pts[0][0] - pts[pts.length - 1][0], pts[0][1] - pts[pts.length - 1][1]) <= 1e-9 * Math.max(1, sizeOf(pts));
/** An arc's sweep from its start angle to its end angle, counterclockwise, in (0, 2π]. */
const sweepOf = (start: number, end: number) => (end - start <= 0 ? end - start + 2 * Math.PI : end - start);

function readPolyline(e: IEntity, out: Sink) {
  const pl = e as ILwpolylineEntity | IPolylineEntity;
  if ("is3dPolyline" in pl && (pl.is3dPolyline || pl.isPolyfaceMesh || pl.is3dPolygonMesh)) return out.skip("3D POLYLINE (not a flat outline)");
  const vs = (pl.vertices ?? []).map((v) => ({ p: [v.x, v.y] as P, bulge: (v as { bulge?: number }).bulge ?? 0 }));
  if (vs.length < 2) return out.skip(`${e.type} with fewer than two points`);
  const closed = pl.shape || (vs.length > 2 && endsMeet(vs.map((v) => v.p)));
  const segs = closed ? vs.length : vs.length - 1;
  const pts: P[] = [];
  let arcs = 0;
  for (let i = 0; i < segs; i++) {
    const a = vs[i];
    const b = vs[(i + 1) % vs.length];
    if (Math.abs(a.bulge) > 1e-12) arcs++;
    const part = bulgePoints(a.p, b.p, a.bulge, out.tolerance);
    pts.push(...(i === 0 ? part : part.slice(1)));
  }
  if (!closed) return out.piece(e, pts, "open polyline");
  const ring = tidyRing(pts, 1e-9 * Math.max(1, sizeOf(pts)));
  out.add(e, `closed polyline${onLayer(e)} (${vs.length} corners${arcs ? `, ${arcs} arcs` : ""})`, { kind: "polygon", points: ring });
}

function readEllipse(e: IEntity, out: Sink) {
  const el = e as IEntity & { center: { x: number; y: number }; majorAxisEndPoint: { x: number; y: number }; axisRatio: number; startAngle: number; endAngle: number };
  const major = Math.hypot(el.majorAxisEndPoint.x, el.majorAxisEndPoint.y);
  const rot = Math.atan2(el.majorAxisEndPoint.y, el.majorAxisEndPoint.x);
  const sweep = sweepOf(el.startAngle, el.endAngle);
  const at = (t: number): P => {
    const x = major * Math.cos(t);
    const y = major * el.axisRatio * Math.sin(t);
    return [el.center.x + x * Math.cos(rot) - y * Math.sin(rot), el.center.y + x * Math.sin(rot) + y * Math.cos(rot)];
  };
  const pts = flattenCurve(at, el.startAngle, el.startAngle + sweep, out.tolerance);
  if (Math.abs(sweep - 2 * Math.PI) < 1e-9) out.add(e, `ellipse${onLayer(e)}`, { kind: "polygon", points: tidyRing(pts, 1e-12) });
  else out.piece(e, pts, "elliptical ARC");
}

function readSpline(e: IEntity, out: Sink) {
  const s = e as ISplineEntity;
  const ctrl = (s.controlPoints ?? []).map((p) => [p.x, p.y] as P);
  if (s.rational) return out.skip("rational SPLINE (weights are not read; export it as a polyline)");
  if (ctrl.length < 2 || !s.knotValues || s.knotValues.length !== ctrl.length + s.degreeOfSplineCurve + 1) return out.skip("SPLINE without control points and knots (fit points only)");
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
  for (let i = 0; i + 1 < breaks.length; i++) pts.push(...flattenCurve(at, breaks[i], breaks[i + 1], out.tolerance).slice(i === 0 ? 0 : 1));
  if (s.closed || s.periodic || endsMeet(pts)) out.add(e, `closed spline${onLayer(e)}`, { kind: "polygon", points: tidyRing(pts, 1e-9 * Math.max(1, sizeOf(pts))) });
  else out.piece(e, pts, "open SPLINE");
}

/** How each entity type the import reads is read; any other type is listed as not used. */
const ENTITY_READERS: Record<string, (e: IEntity, out: Sink) => void> = {
  CIRCLE: (e, out) => {
    const c = e as ICircleEntity;
    out.add(e, `circle${onLayer(e)}, ⌀ ${round(2 * c.radius)}`, { kind: "circle", center: [c.center.x, c.center.y], radius: c.radius });
  },
  LWPOLYLINE: readPolyline,
  POLYLINE: readPolyline,
  LINE: (e, out) => {
    const l = e as ILineEntity;
    if (!l.vertices || l.vertices.length < 2) return out.skip("LINE without two ends");
    out.piece(e, [[l.vertices[0].x, l.vertices[0].y], [l.vertices[1].x, l.vertices[1].y]], "LINE");
  },
  ARC: (e, out) => {
    const a = e as IArcEntity;
    out.piece(e, arcPoints([a.center.x, a.center.y], a.radius, a.startAngle, sweepOf(a.startAngle, a.endAngle), out.tolerance), "ARC");
  },
  ELLIPSE: readEllipse,
  SPLINE: readSpline,
};

/** Parses a DXF text (after counting its entities against the limit) and reads its closed shapes. */
function parseDxf(text: string) {
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
  return { entities: dxf.entities, declaredUnit: typeof dxf.header?.$INSUNITS === "number" ? (DXF_UNITS[dxf.header.$INSUNITS] ?? null) : null };
}

export function readDxf(text: string, tolerance: number): DrawingRead {
  const { entities, declaredUnit } = parseDxf(text);
  const shapes: DrawingShape[] = [];
  const pieces: Piece[] = [];
  const skipped = new Map<string, number>();
  let seq = 0;
  const out: Sink = {
    tolerance,
    add: (e, source, shape) => shapes.push({ id: `d${++seq}`, source, layer: layerOf(e), shape }),
    piece: (e, points, what) => pieces.push({ points, what, layer: layerOf(e) }),
    skip: (what) => skipped.set(what, (skipped.get(what) ?? 0) + 1),
  };
  for (const e of entities) (ENTITY_READERS[e.type] ?? ((x: IEntity) => out.skip(x.type)))(e, out);
  const all = pieces.flatMap((p) => p.points);
  const { loops, open } = joinPieces(pieces, 1e-6 * Math.max(1, all.length ? sizeOf(all) : 1));
  for (const loop of loops) {
    shapes.push({ id: `d${++seq}`, source: `${loop.what}${loop.layer ? ` on layer ${loop.layer}` : ""}`, layer: loop.layer ?? null, shape: { kind: "polygon", points: tidyRing(loop.points, 1e-9) } });
  }
  for (const o of open) out.skip(o.what === "open polyline" ? "open polyline" : `${o.what} not joined into a closed loop`);
  const notUsed = counted(skipped);
  if (shapes.length === 0) throw noClosed("DXF", notUsed);
  return { format: "dxf", shapes, notUsed, declaredUnit };
}
