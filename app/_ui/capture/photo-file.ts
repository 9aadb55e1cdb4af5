// What the browser checks of a deck photo before it shows or keeps it (the server checks again by the bytes,
// with the same words from model/photo-files.ts).
export { MAX_PHOTO_MB, photoProblem, sniffPhotoType, type PhotoType } from "@/model/photo-files";

/** The circle through three points (their circumcircle), or null when they lie on one line. */
export function circleThrough(a: readonly [number, number], b: readonly [number, number], c: readonly [number, number]): { centerMm: [number, number]; diameterMm: number } | null {
  const d = 2 * (a[0] * (b[1] - c[1]) + b[0] * (c[1] - a[1]) + c[0] * (a[1] - b[1]));
  const size = Math.max(Math.hypot(a[0] - b[0], a[1] - b[1]), Math.hypot(b[0] - c[0], b[1] - c[1]), Math.hypot(a[0] - c[0], a[1] - c[1]));
  if (Math.abs(d) <= 1e-9 * size * size) return null;
  const s = (p: readonly [number, number]) => p[0] * p[0] + p[1] * p[1];
  const x = (s(a) * (b[1] - c[1]) + s(b) * (c[1] - a[1]) + s(c) * (a[1] - b[1])) / d;
  const y = (s(a) * (c[0] - b[0]) + s(b) * (a[0] - c[0]) + s(c) * (b[0] - a[0])) / d;
  return { centerMm: [x, y], diameterMm: 2 * Math.hypot(a[0] - x, a[1] - y) };
}
