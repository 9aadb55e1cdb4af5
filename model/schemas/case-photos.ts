// Request shapes of a case profile's deck photos and the reference points a trace is scaled by.
// No server-only code: the case form reads the same shapes.
import { z } from "zod";
import { checkReferencePoints, orderAsRectangle, ReferencePointsError } from "@/geometry/homography";
import { MAX_PHOTO_BYTES, PHOTO_TYPES } from "@/model/photo-files";

/** The largest photo side accepted, in pixels (a 100-megapixel camera is below it). */
export const MAX_PHOTO_SIDE_PX = 100_000;

const pixel = z
  .number({ error: "A reference point is a pixel position (a number)." })
  .refine(Number.isFinite, "A reference point must be a finite number.")
  .min(0, "A reference point lies on the photo: its pixel positions are not negative.")
  .max(MAX_PHOTO_SIDE_PX, `A reference point lies on the photo: at most ${MAX_PHOTO_SIDE_PX} pixels.`);
const point = z.tuple([pixel, pixel], { error: "A reference point is [x, y] in the photo's pixels." });
const measuredMm = (what: string) =>
  z
    .number({ error: `${what} is a number in mm.` })
    .refine(Number.isFinite, `${what} must be a finite number.`)
    .positive(`${what} must be above zero.`)
    .max(10_000, `${what} above 10 m is not a measurement of a deck.`);

/** Refuses points on one spot or three on one line (the core's test), and four that are no four-sided figure. */
function fixesAMap(ref: { kind: "scale" | "rectangle"; points: readonly (readonly [number, number])[] }, ctx: z.RefinementCtx) {
  try {
    if (ref.kind === "rectangle") orderAsRectangle(ref.points);
    else checkReferencePoints(ref.points, "two points");
  } catch (error) {
    if (!(error instanceof ReferencePointsError)) throw error;
    ctx.addIssue({ code: "custom", path: ["points"], message: error.message });
  }
}

/**
 * The reference points a photo was scaled or squared up by, in the original photo's pixels (upright):
 * two points and the distance measured between them, or four corners of a measured rectangle.
 */
export const PhotoReferenceSchema = z
  .discriminatedUnion(
    "kind",
    [
      z.strictObject({ kind: z.literal("scale"), points: z.tuple([point, point], { error: "Two points: [[x, y], [x, y]]." }), distanceMm: measuredMm("The distance between the points") }),
      z.strictObject({
        kind: z.literal("rectangle"),
        points: z.tuple([point, point, point, point], { error: "Four points: one on each corner of the rectangle." }),
        widthMm: measuredMm("The rectangle's width"),
        heightMm: measuredMm("The rectangle's height"),
      }),
    ],
    { error: 'The reference is "scale" (two points and a distance) or "rectangle" (four points, width and height).' },
  )
  .superRefine(fixesAMap);

export type PhotoReference = z.infer<typeof PhotoReferenceSchema>;

/** Each reference point that lies outside a photo of this size, by its path ("points.2"), or null when all lie on it. */
export function pointsOutsidePhoto(ref: PhotoReference, widthPx: number, heightPx: number): Record<string, string> | null {
  const out: Record<string, string> = {};
  ref.points.forEach(([x, y], i) => {
    if (x > widthPx || y > heightPx) out[`points.${i}`] = `Point ${i + 1} (${Math.round(x)}, ${Math.round(y)}) lies outside the ${widthPx} × ${heightPx} pixel photo.`;
  });
  return Object.keys(out).length ? out : null;
}

const sidePx = z.number({ error: "A photo side is a whole number of pixels." }).int("A photo side is a whole number of pixels.").min(1).max(MAX_PHOTO_SIDE_PX);

/** Starting a case photo's upload: the file's type and size, the upright size the browser read, and the reference points if already set. */
export const CasePhotoRequestSchema = z
  .strictObject({
    contentType: z.enum(PHOTO_TYPES, { error: "Only JPEG, PNG or WebP photos are accepted." }),
    sizeBytes: z.number({ error: "Send the file's size in bytes." }).int().min(1, "The file is empty.").max(MAX_PHOTO_BYTES, `Photos are limited to ${MAX_PHOTO_BYTES / 1024 / 1024} MB.`),
    widthPx: sidePx.optional(),
    heightPx: sidePx.optional(),
    reference: PhotoReferenceSchema.optional(),
  })
  .superRefine((body, ctx) => {
    if (!body.reference) return;
    if (body.widthPx === undefined || body.heightPx === undefined) {
      ctx.addIssue({ code: "custom", path: ["reference"], message: "Send the photo's widthPx and heightPx with its reference points." });
      return;
    }
    for (const [path, message] of Object.entries(pointsOutsidePhoto(body.reference, body.widthPx, body.heightPx) ?? {})) {
      ctx.addIssue({ code: "custom", path: ["reference", ...path.split(".").map((p) => (/^\d+$/.test(p) ? Number(p) : p))], message });
    }
  });

/** Setting or clearing the reference points of a kept photo. */
export const CasePhotoPatchSchema = z.strictObject({
  reference: PhotoReferenceSchema.nullable(),
});
