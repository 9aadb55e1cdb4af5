// What makes a file a photo the product keeps: its type read from its first bytes (never from its name or a
// header) and its size. The browser checks before it shows or sends a file; the server checks the stored
// bytes again, with the same words; the upload requests' schemas take their limits from here.

/** The image types kept. */
export const PHOTO_TYPES = ["image/jpeg", "image/png", "image/webp"] as const;
/** Largest photo accepted, bytes. */
export const MAX_PHOTO_BYTES = 8 * 1024 * 1024;

export type PhotoType = (typeof PHOTO_TYPES)[number];

/** Largest photo accepted, MB. */
export const MAX_PHOTO_MB = MAX_PHOTO_BYTES / 1024 / 1024;

const NOT_AN_IMAGE = "The file is not a JPEG, PNG or WebP image (its contents say otherwise, whatever its name).";

/** The image type a file's first bytes show, or null. JPEG FF D8 FF; PNG 89 50 4E 47 0D 0A 1A 0A; WebP "RIFF"…"WEBP". */
export function sniffPhotoType(head: Uint8Array): PhotoType | null {
  if (head.length >= 3 && head[0] === 0xff && head[1] === 0xd8 && head[2] === 0xff) return "image/jpeg";
  if (head.length >= 8 && [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a].every((v, i) => head[i] === v)) return "image/png";
  const ascii = (from: number, to: number) => String.fromCharCode(...head.slice(from, to));
  if (head.length >= 12 && ascii(0, 4) === "RIFF" && ascii(8, 12) === "WEBP") return "image/webp";
  return null;
}

/** The file name ending a stored photo of this type takes. */
export function photoExtension(type: PhotoType): "jpg" | "png" | "webp" {
  return type === "image/jpeg" ? "jpg" : type === "image/png" ? "png" : "webp";
}

/** Why a file is too large to keep, or null when it is within the limit. */
export function photoSizeProblem(sizeBytes: number): string | null {
  return sizeBytes > MAX_PHOTO_BYTES ? `The file is ${(sizeBytes / 1024 / 1024).toFixed(1)} MB; photos are limited to ${MAX_PHOTO_MB} MB.` : null;
}

/** Why a photo is refused before anything is shown or kept, or null when it may go on. */
export function photoProblem(sizeBytes: number, type: PhotoType | null): string | null {
  if (sizeBytes === 0) return "The file is empty.";
  return photoSizeProblem(sizeBytes) ?? (type ? null : NOT_AN_IMAGE);
}

/** Why an uploaded file is refused, from its stored size and first bytes against the type it was declared as; null when it is kept. */
export function uploadedPhotoProblem(sizeBytes: number, head: Uint8Array, declared: string): string | null {
  const sniffed = sniffPhotoType(head);
  const tooLarge = photoSizeProblem(sizeBytes);
  if (tooLarge) return tooLarge;
  if (!sniffed) return NOT_AN_IMAGE;
  if (sniffed !== declared) return `The file is a ${sniffed.slice(6).toUpperCase()} image but was declared as ${declared.slice(6).toUpperCase()}; choose the file again.`;
  return null;
}
