import { MAX_PHOTO_BYTES } from "@/model/schemas/jobs";

// What the browser checks of a deck photo before it shows or keeps it (the server checks again by the bytes).

export const MAX_PHOTO_MB = MAX_PHOTO_BYTES / 1024 / 1024;

export type PhotoType = "image/jpeg" | "image/png" | "image/webp";

/** The image type a file's first bytes show, or null. JPEG FF D8 FF; PNG 89 50 4E 47 0D 0A 1A 0A; WebP "RIFF"…"WEBP". */
export function sniffPhotoType(head: Uint8Array): PhotoType | null {
  if (head.length >= 3 && head[0] === 0xff && head[1] === 0xd8 && head[2] === 0xff) return "image/jpeg";
  if (head.length >= 8 && [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a].every((v, i) => head[i] === v)) return "image/png";
  const ascii = (from: number, to: number) => String.fromCharCode(...head.slice(from, to));
  if (head.length >= 12 && ascii(0, 4) === "RIFF" && ascii(8, 12) === "WEBP") return "image/webp";
  return null;
}

/** Why a photo is refused before anything is shown or kept, or null when it may go on. */
export function photoProblem(sizeBytes: number, type: PhotoType | null): string | null {
  if (sizeBytes === 0) return "The file is empty.";
  if (sizeBytes > MAX_PHOTO_BYTES) return `The file is ${(sizeBytes / 1024 / 1024).toFixed(1)} MB; photos are limited to ${MAX_PHOTO_MB} MB.`;
  if (!type) return "The file is not a JPEG, PNG or WebP image (its contents say otherwise, whatever its name).";
  return null;
}

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
