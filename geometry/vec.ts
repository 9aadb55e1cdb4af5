/** A point or vector in the deck plane, in mm. */
export type Vec2 = readonly [x: number, y: number];

export const ORIGIN: Vec2 = [0, 0];

/** a + b. */
export function add(a: Vec2, b: Vec2): Vec2 {
  return [a[0] + b[0], a[1] + b[1]];
}

/** a − b. */
export function sub(a: Vec2, b: Vec2): Vec2 {
  return [a[0] - b[0], a[1] - b[1]];
}

/** k · a. */
export function scale(a: Vec2, k: number): Vec2 {
  return [a[0] * k, a[1] * k];
}

/** Euclidean length √(x² + y²) (Math.sqrt rather than Math.hypot: several times faster, and no length here comes near overflow). */
export function length(a: Vec2): number {
  return Math.sqrt(a[0] * a[0] + a[1] * a[1]);
}

/** |a − b|. */
export function distance(a: Vec2, b: Vec2): number {
  const dx = a[0] - b[0];
  const dy = a[1] - b[1];
  return Math.sqrt(dx * dx + dy * dy);
}

/** a / |a|, or the +x unit vector when a is shorter than the tolerance (direction undefined). */
export function unit(a: Vec2, toleranceMm: number): Vec2 {
  const l = length(a);
  return l <= toleranceMm ? [1, 0] : [a[0] / l, a[1] / l];
}

/** Direction of a in degrees, counter-clockwise from +x, in [0, 360). */
export function angleDeg(a: Vec2): number {
  const deg = (Math.atan2(a[1], a[0]) * 180) / Math.PI;
  return deg < 0 ? deg + 360 : deg;
}

/** Arithmetic mean of the points (the centre of a stud pattern). */
export function centroid(points: readonly Vec2[]): Vec2 {
  let x = 0;
  let y = 0;
  for (const p of points) {
    x += p[0];
    y += p[1];
  }
  return [x / points.length, y / points.length];
}
