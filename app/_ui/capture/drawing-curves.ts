import { DrawingFileError, type P } from "./drawing-types";

// Curves flattened to points within a chord tolerance, and the helpers both readers share.

// ---------------------------------------------------------------- curves

/** Points along a circular arc from angle a0 turning by sweep (radians, + counter-clockwise), ends included. */
export function arcPoints(center: P, radius: number, a0: number, sweep: number, tolerance: number): P[] {
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
export function bulgePoints(p: P, q: P, bulge: number, tolerance: number): P[] {
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

export function distToChord(p: P, a: P, b: P): number {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const len = Math.hypot(dx, dy);
  if (len === 0) return Math.hypot(p[0] - a[0], p[1] - a[1]);
  const t = Math.max(0, Math.min(1, ((p[0] - a[0]) * dx + (p[1] - a[1]) * dy) / (len * len)));
  return Math.hypot(p[0] - a[0] - t * dx, p[1] - a[1] - t * dy);
}

/** Flattens a parametric curve on [t0, t1] by halving until the quarter points lie within the tolerance of each chord. */
export function flattenCurve(at: (t: number) => P, t0: number, t1: number, tolerance: number, depth = 0): P[] {
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
export function cubicPoints(p0: P, p1: P, p2: P, p3: P, tolerance: number, depth = 0): P[] {
  if (depth >= 18 || (distToChord(p1, p0, p3) <= tolerance && distToChord(p2, p0, p3) <= tolerance)) return [p0, p3];
  const m = (a: P, b: P): P => [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2];
  const p01 = m(p0, p1), p12 = m(p1, p2), p23 = m(p2, p3);
  const p012 = m(p01, p12), p123 = m(p12, p23);
  const mid = m(p012, p123);
  return [...cubicPoints(p0, p01, p012, mid, tolerance, depth + 1), ...cubicPoints(mid, p123, p23, p3, tolerance, depth + 1).slice(1)];
}

/** SVG elliptical arc from its endpoint form (SVG 1.1, appendix F.6.5: conversion to centre form), flattened. */
export function svgArcPoints(p: P, rxIn: number, ryIn: number, phiDeg: number, largeArc: boolean, sweepFlag: boolean, q: P, tolerance: number): P[] {
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

export function sizeOf(points: P[]): number {
  let minX = Infinity, minY = Infinity, maxX = -Infinity, maxY = -Infinity;
  for (const [x, y] of points) {
    minX = Math.min(minX, x); minY = Math.min(minY, y); maxX = Math.max(maxX, x); maxY = Math.max(maxY, y);
  }
  return Math.hypot(maxX - minX, maxY - minY);
}

/** Drops repeated points and the closing point that repeats the first. */
export function tidyRing(points: P[], eps: number): P[] {
  const out: P[] = [];
  for (const p of points) {
    const last = out[out.length - 1];
    if (!last || Math.hypot(p[0] - last[0], p[1] - last[1]) > eps) out.push(p);
  }
  while (out.length > 1 && Math.hypot(out[0][0] - out[out.length - 1][0], out[0][1] - out[out.length - 1][1]) <= eps) out.pop();
  return out;
}

export function counted(counts: Map<string, number>): string[] {
  return [...counts.entries()].map(([what, n]) => `${n} ${what}`);
}

export function noClosed(format: string, notUsed: string[]): DrawingFileError {
  const found = notUsed.length ? ` Found: ${notUsed.join(", ")}.` : " It holds no shapes at all.";
  return new DrawingFileError("no-closed-outline", `No closed outline in this ${format} drawing.${found} Draw the deck as a closed polyline or a closed path.`);
}

export type Piece = { points: P[]; what: string; layer?: string | null };

/** Joins open pieces (lines, arcs) whose ends meet into closed loops; the rest stay open. */
export function joinPieces(pieces: Piece[], eps: number): { loops: Piece[]; open: Piece[] } {
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

/** A length for a message, to 0.001 of the drawing's unit. */
export function round(v: number): string {
  return String(Number(v.toFixed(3)));
}
