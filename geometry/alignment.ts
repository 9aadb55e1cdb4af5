import { DegenerateGeometryError } from "./errors";
import { type Vec2, add, angleDeg, length, scale, sub } from "./vec";

/** A holder-height reading at a point of the deck: h is the height of the holder above the deck. */
export interface HeightPoint {
  readonly atMm: Vec2;
  readonly heightMm: number;
}

/** Least-squares plane h = a·x + b·y + c through the readings, with its residuals. */
export interface PlaneFit {
  readonly a: number;
  readonly b: number;
  readonly cMm: number;
  /** Reading − fitted height at each point, in the order given. */
  readonly residualsMm: number[];
  /** Rocking: the largest |residual|. */
  readonly rockMm: number;
}

/** Least-squares plane h = a·x + b·y + c (normal equations on centred data), or null when fewer than 3 points or all collinear. */
export function tryFitPlane(points: readonly HeightPoint[]): PlaneFit | null {
  const n = points.length;
  if (n < 3) return null;
  let mx = 0;
  let my = 0;
  let mh = 0;
  for (const p of points) {
    mx += p.atMm[0];
    my += p.atMm[1];
    mh += p.heightMm;
  }
  mx /= n;
  my /= n;
  mh /= n;
  let sxx = 0;
  let syy = 0;
  let sxy = 0;
  let sxh = 0;
  let syh = 0;
  for (const p of points) {
    const x = p.atMm[0] - mx;
    const y = p.atMm[1] - my;
    const h = p.heightMm - mh;
    sxx += x * x;
    syy += y * y;
    sxy += x * y;
    sxh += x * h;
    syh += y * h;
  }
  const det = sxx * syy - sxy * sxy;
  // Relative test: the points span no area (collinear) when det is negligible against (Sxx + Syy)².
  if (!(det > 1e-12 * (sxx + syy) ** 2)) return null;
  const a = (sxh * syy - syh * sxy) / det;
  const b = (syh * sxx - sxh * sxy) / det;
  const cMm = mh - a * mx - b * my;
  const residualsMm = points.map((p) => p.heightMm - (a * p.atMm[0] + b * p.atMm[1] + cMm));
  return { a, b, cMm, residualsMm, rockMm: Math.max(...residualsMm.map(Math.abs)) };
}

/** Least-squares plane h = a·x + b·y + c; throws DegenerateGeometryError when the points do not define a plane. */
export function fitPlane(points: readonly HeightPoint[]): PlaneFit {
  const fit = tryFitPlane(points);
  if (!fit) throw new DegenerateGeometryError("a plane needs at least 3 readings that are not on one line");
  return fit;
}

/** Tilt of the holder: θ = atan(√(a² + b²)), in degrees. */
export function tiltDeg(fit: Pick<PlaneFit, "a" | "b">): number {
  return (Math.atan(Math.hypot(fit.a, fit.b)) * 180) / Math.PI;
}

/** Direction of the high side of the holder: the gradient (a, b), degrees counter-clockwise from +x. */
export function tiltDirectionDeg(fit: Pick<PlaneFit, "a" | "b">): number {
  return angleDeg([fit.a, fit.b]);
}

/** Height of the fitted plane above the deck at p: a·x + b·y + c. */
export function planeHeightMm(fit: Pick<PlaneFit, "a" | "b" | "cMm">, p: Vec2): number {
  return fit.a * p[0] + fit.b * p[1] + fit.cMm;
}

/**
 * Tool-axis position at depth z below the deck. The axis is square to the holder and passes through the
 * bearing at the pattern centre P, height h₀ = h(P): axis(z) = P + (h₀ + z)·(a, b), toward the high side.
 */
export function axisAtDepthMm(fit: Pick<PlaneFit, "a" | "b" | "cMm">, bearingMm: Vec2, zMm: number): Vec2 {
  return add(bearingMm, scale([fit.a, fit.b], planeHeightMm(fit, bearingMm) + zMm));
}

/** Lateral shift of the tool axis at depth z: |(h₀ + z)·(a, b)|. */
export function lateralShiftMm(fit: Pick<PlaneFit, "a" | "b" | "cMm">, bearingMm: Vec2, zMm: number): number {
  return length(sub(axisAtDepthMm(fit, bearingMm, zMm), bearingMm));
}

/** Depth variation across a tilted cut bottom of diameter D: D·tanθ = D·√(a² + b²) (the shallowest point lies this far above the deepest). */
export function depthVariationMm(fit: Pick<PlaneFit, "a" | "b">, cutDiameterMm: number): number {
  return cutDiameterMm * Math.hypot(fit.a, fit.b);
}
