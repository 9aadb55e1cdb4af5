import { z } from "zod";
import { MAX_PHOTO_BYTES, PHOTO_TYPES } from "@/model/schemas/jobs";

/** Starting a case photo's upload: the file's type and size, and the upright size the browser read. */
export const CasePhotoRequestSchema = z.strictObject({
  contentType: z.enum(PHOTO_TYPES, { error: "Only JPEG, PNG or WebP photos are accepted." }),
  sizeBytes: z.number({ error: "Send the file's size in bytes." }).int().min(1, "The file is empty.").max(MAX_PHOTO_BYTES, `Photos are limited to ${MAX_PHOTO_BYTES / 1024 / 1024} MB.`),
  widthPx: z.number().int().min(1).max(100_000).optional(),
  heightPx: z.number().int().min(1).max(100_000).optional(),
});
