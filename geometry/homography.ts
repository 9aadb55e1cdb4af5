import { Matrix, solve } from "ml-matrix";
import { GeometryError } from "./errors";

// Plane-to-plane maps for tracing a photo: the perspective transform (a 3×3 homography) from four or more
// point pairs, and the plain two-point scale. Points are [x, y]; in a photo x runs right and y down (pixels),
// in the case's frame x runs right and y up (mm).

export type Point = readonly [number, number];

/** A 3×3 homography, row-major, scaled so that the last entry is 1. */
export type Homography = readonly [number, number, number, number, number, number, number, number, number];

export type ReferenceProblem = "coincident" | "collinear" | "not-convex" | "too-few" | "bad-distance";

/** Reference points that cannot define a scale or a perspective: said in words, with what was wrong. */
export class ReferencePointsError extends GeometryError {
  constructor(
    readonly problem: ReferenceProblem,
    message: string,
  ) {
    super("degenerate-geometry", message);
    this.name = "ReferencePointsError";
  }
}

const dist = (a: Point, b: Point) => Math.hypot(a[0] - b[0], a[1] - b[1]);
const cross = (o: Point, a: Point, b: Point) => (a[0] - o[0]) * (b[1] - o[1]) - (a[1] - o[1]) * (b[0] - o[0]);

function spread(points: readonly Point[]): number {
  let s = 0;
  for (const a of points) for (const b of points) s = Math.max(s, dist(a, b));
  return s;
}

/**
 * Refuses point sets that fix no plane map: two points on one spot, or three on one line.
 * "On one spot" and "on one line" are judged against the points' own spread (1e-6 of it).
 */
export function checkReferencePoints(points: readonly Point[], what = "reference points"): void {
  if (points.some((p) => !Number.isFinite(p[0]) || !Number.isFinite(p[1]))) {
    throw new ReferencePointsError("bad-distance", `The ${what} must be finite numbers.`);
  }
  const size = spread(points);
  for (let i = 0; i < points.length; i++) {
    for (let j = i + 1; j < points.length; j++) {
      if (dist(points[i], points[j]) <= 1e-6 * size || size === 0) {
        throw new ReferencePointsError("coincident", `Two of the ${what} (${i + 1} and ${j + 1}) are on the same spot; place each one on its own mark.`);
      }
    }
  }
  if (points.length < 3) return;
  for (let i = 0; i < points.length; i++) {
    for (let j = i + 1; j < points.length; j++) {
      for (let k = j + 1; k < points.length; k++) {
        // Twice the triangle's area over its longest side is its height: under 1e-6 of the spread is a line.
        const height = Math.abs(cross(points[i], points[j], points[k])) / Math.max(dist(points[i], points[j]), dist(points[j], points[k]), dist(points[i], points[k]));
        if (height <= 1e-6 * size) {
          throw new ReferencePointsError("collinear", `Three of the ${what} (${i + 1}, ${j + 1} and ${k + 1}) lie on one line; they cannot fix a perspective. Use four points at the corners of a rectangle.`);
        }
      }
    }
  }
}

/** Moves points to their centroid and scales them to a mean distance of √2 (the usual conditioning before a solve). */
function conditioner(points: readonly Point[]): { t: Matrix; inverse: Matrix } {
  const cx = points.reduce((s, p) => s + p[0], 0) / points.length;
  const cy = points.reduce((s, p) => s + p[1], 0) / points.length;
  const mean = points.reduce((s, p) => s + Math.hypot(p[0] - cx, p[1] - cy), 0) / points.length;
  const k = Math.SQRT2 / mean;
  return {
    t: new Matrix([[k, 0, -k * cx], [0, k, -k * cy], [0, 0, 1]]),
    inverse: new Matrix([[1 / k, 0, cx], [0, 1 / k, cy], [0, 0, 1]]),
  };
}

function apply3(m: Matrix, p: Point): Point {
  const w = m.get(2, 0) * p[0] + m.get(2, 1) * p[1] + m.get(2, 2);
  return [(m.get(0, 0) * p[0] + m.get(0, 1) * p[1] + m.get(0, 2)) / w, (m.get(1, 0) * p[0] + m.get(1, 1) * p[1] + m.get(1, 2)) / w];
}

/**
 * The homography that maps each `from` point onto its `to` point: exact for four pairs, the least-squares
 * fit for more. Both sets are conditioned first; the 8 unknowns (last entry 1) are solved by ml-matrix
 * (LU for a square system, QR for an overdetermined one).
 */
export function solveHomography(from: readonly Point[], to: readonly Point[]): Homography {
  if (from.length !== to.length || from.length < 4) {
    throw new ReferencePointsError("too-few", "A perspective needs four point pairs (or more), one for each clicked point.");
  }
  checkReferencePoints(from, "points clicked");
  checkReferencePoints(to, "target points");
  const cf = conditioner(from);
  const ct = conditioner(to);
  const a: number[][] = [];
  const b: number[] = [];
  from.forEach((p, i) => {
    const [x, y] = apply3(cf.t, p);
    const [u, v] = apply3(ct.t, to[i]);
    a.push([x, y, 1, 0, 0, 0, -u * x, -u * y]);
    b.push(u);
    a.push([0, 0, 0, x, y, 1, -v * x, -v * y]);
    b.push(v);
  });
  const h = solve(new Matrix(a), Matrix.columnVector(b)).to1DArray();
  if (h.some((v) => !Number.isFinite(v))) {
    throw new ReferencePointsError("collinear", "These points do not fix a perspective (the solve found no unique answer); place them at the corners of a rectangle.");
  }
  const conditioned = new Matrix([[h[0], h[1], h[2]], [h[3], h[4], h[5]], [h[6], h[7], 1]]);
  const full = ct.inverse.mmul(conditioned).mmul(cf.t);
  const last = full.get(2, 2);
  return full.to1DArray().map((v) => v / last) as unknown as Homography;
}

/** Where the homography sends a point. */
export function applyHomography(h: Homography, p: Point): [number, number] {
  const w = h[6] * p[0] + h[7] * p[1] + h[8];
  return [(h[0] * p[0] + h[1] * p[1] + h[2]) / w, (h[3] * p[0] + h[4] * p[1] + h[5]) / w];
}

/** The inverse map, scaled so that its last entry is 1. */
export function invertHomography(h: Homography): Homography {
  const inv = new Matrix([[h[0], h[1], h[2]], [h[3], h[4], h[5]], [h[6], h[7], h[8]]]);
  const m = solve(inv, Matrix.eye(3, 3));
  const last = m.get(2, 2);
  return m.to1DArray().map((v) => v / last) as unknown as Homography;
}

/** A photo's pixels to the case's millimetres: a perspective, or a plain scale from two points. */
export type PhotoToMm = { kind: "perspective"; h: Homography } | { kind: "scale"; mmPerPx: number; originPx: Point };

export function pxToMm(map: PhotoToMm, p: Point): [number, number] {
  if (map.kind === "perspective") return applyHomography(map.h, p);
  return [(p[0] - map.originPx[0]) * map.mmPerPx, -(p[1] - map.originPx[1]) * map.mmPerPx];
}

export function mmToPx(map: PhotoToMm, p: Point): [number, number] {
  if (map.kind === "perspective") return applyHomography(invertHomography(map.h), p);
  return [map.originPx[0] + p[0] / map.mmPerPx, map.originPx[1] - p[1] / map.mmPerPx];
}

/**
 * The two-point scale: two clicked points and the measured distance between them. The origin goes midway
 * between them (two studs across the pattern's diagonal put it on the cylinder axis); photo-up is +y.
 */
export function twoPointScale(a: Point, b: Point, distanceMm: number): PhotoToMm {
  if (!Number.isFinite(distanceMm) || distanceMm <= 0) {
    throw new ReferencePointsError("bad-distance", "Type the measured distance between the two points, greater than zero.");
  }
  checkReferencePoints([a, b], "two points");
  return { kind: "scale", mmPerPx: distanceMm / dist(a, b), originPx: [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2] };
}

/**
 * Orders four photo points around their centroid as the rectangle's corners: bottom-left, bottom-right,
 * top-right, top-left as seen in the photo (y down), whatever order they were clicked in.
 */
export function orderAsRectangle(points: readonly Point[]): [Point, Point, Point, Point] {
  if (points.length !== 4) throw new ReferencePointsError("too-few", "Click exactly four points, one on each corner of the rectangle.");
  checkReferencePoints(points, "four points");
  const cx = points.reduce((s, p) => s + p[0], 0) / 4;
  const cy = points.reduce((s, p) => s + p[1], 0) / 4;
  // Angle in the y-up sense; bottom-left is at -135°.
  const angle = (p: Point) => Math.atan2(-(p[1] - cy), p[0] - cx);
  const sorted = [...points].sort((p, q) => angle(p) - angle(q));
  const start = sorted.reduce((best, p, i) => {
    const off = Math.abs(Math.atan2(Math.sin(angle(p) + 0.75 * Math.PI), Math.cos(angle(p) + 0.75 * Math.PI)));
    return off < best.off ? { i, off } : best;
  }, { i: 0, off: Infinity }).i;
  const ordered = [0, 1, 2, 3].map((k) => sorted[(start + k) % 4]) as [Point, Point, Point, Point];
  for (let i = 0; i < 4; i++) {
    const turn = cross(ordered[i], ordered[(i + 1) % 4], ordered[(i + 2) % 4]);
    // Counter-clockwise in the y-up sense is a negative cross product in photo pixels (y down).
    if (turn >= 0) throw new ReferencePointsError("not-convex", "The four points do not make a four-sided figure with corners; place one on each corner of the rectangle.");
  }
  return ordered;
}

export type RectangleFit = {
  map: PhotoToMm;
  /** The width ÷ height of the rectangle that the four points show, judged with a pinhole camera whose centre is the photo's. */
  seenAspect: number;
  /** How far (mm) a corner of the stated rectangle sits from the rectangle the photo shows, both of the same size. */
  misfitMm: number;
  /** Above this, the points are said not to fit. */
  warnAboveMm: number;
  fits: boolean;
  /** The camera model did not apply (a photo from almost straight above, or points no camera could give): judged as a parallelogram. */
  judgedFlat: boolean;
  summary: string;
};

/**
 * Perspective from four clicked points of a known rectangle (e.g. the four studs, widthMm along x and heightMm
 * along y, origin at the rectangle's centre), and how well they fit it.
 *
 * Four points always fix a perspective exactly, so the fit is judged on the rectangle's proportions: for a
 * pinhole camera with square pixels and its centre at the photo's centre, the four image points fix the
 * focal length and the proportions of the rectangle they show (Zhang and He, "Whiteboard scanning and image
 * enhancement", Digital Signal Processing 17 (2007)). A cropped photo moves the centre and weakens the judgement.
 */
export function rectangleFit(
  clickedPx: readonly Point[],
  widthMm: number,
  heightMm: number,
  photoSizePx: { width: number; height: number },
  format: (mm: number) => string = (mm) => `${Number(mm.toFixed(1))} mm`,
): RectangleFit {
  if (!(widthMm > 0) || !(heightMm > 0) || !Number.isFinite(widthMm) || !Number.isFinite(heightMm)) {
    throw new ReferencePointsError("bad-distance", "Type the measured spacing across and along the pattern, each greater than zero.");
  }
  const [bl, br, tr, tl] = orderAsRectangle(clickedPx);
  const w = widthMm / 2;
  const hh = heightMm / 2;
  const h = solveHomography([bl, br, tr, tl], [[-w, -hh], [w, -hh], [w, hh], [-w, hh]]);

  const { aspect, flat } = seenAspect([bl, br, tl, tr], [photoSizePx.width / 2, photoSizePx.height / 2]);
  const size = Math.sqrt(widthMm * heightMm);
  const seenW = size * Math.sqrt(aspect);
  const seenH = size / Math.sqrt(aspect);
  const misfitMm = Math.hypot((seenW - widthMm) / 2, (seenH - heightMm) / 2);
  const warnAboveMm = Math.max(0.5, 0.01 * Math.hypot(widthMm, heightMm));
  const fits = misfitMm <= warnAboveMm;
  const rect = `${format(widthMm)} × ${format(heightMm)} rectangle`;
  const summary = fits
    ? `The four points fit a ${rect} within ${format(misfitMm)}.`
    : `The four points do not fit a ${rect}: they show one about ${format(seenW)} × ${format(seenH)} (off by ${format(misfitMm)} at a corner). Check the measured spacing and the clicked points.`;
  return { map: { kind: "perspective", h }, seenAspect: aspect, misfitMm, warnAboveMm, fits, judgedFlat: flat, summary };
}

type H3 = [number, number, number];
const cross3 = (a: H3, b: H3): H3 => [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
const dot3 = (a: H3, b: H3) => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];

/**
 * Width ÷ height of the rectangle whose corners m1 (0,0), m2 (w,0), m3 (0,h), m4 (w,h) show in the photo at
 * the given pixels. Pixels are taken about the principal point and the photo's y-down flip does not change
 * the proportions.
 */
export function seenAspect(corners: readonly [Point, Point, Point, Point], principalPx: Point): { aspect: number; flat: boolean } {
  const [m1, m2, m3, m4] = corners.map((p) => [p[0] - principalPx[0], p[1] - principalPx[1], 1] as H3);
  const k2 = dot3(cross3(m1, m4), m3) / dot3(cross3(m2, m4), m3);
  const k3 = dot3(cross3(m1, m4), m2) / dot3(cross3(m3, m4), m2);
  const n2: H3 = [k2 * m2[0] - m1[0], k2 * m2[1] - m1[1], k2 - 1];
  const n3: H3 = [k3 * m3[0] - m1[0], k3 * m3[1] - m1[1], k3 - 1];
  const plane2 = n2[0] * n2[0] + n2[1] * n2[1];
  const plane3 = n3[0] * n3[0] + n3[1] * n3[1];
  const f2 = -(n2[0] * n3[0] + n2[1] * n3[1]) / (n2[2] * n3[2]);
  if (Number.isFinite(f2) && f2 > 0) {
    return { aspect: Math.sqrt((plane2 + f2 * n2[2] * n2[2]) / (plane3 + f2 * n3[2] * n3[2])), flat: false };
  }
  // No camera with this centre gives these points (or the photo is square on): judge them as a parallelogram.
  return { aspect: Math.sqrt(plane2 / plane3), flat: true };
}
