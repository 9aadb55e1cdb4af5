import { index, integer, sqliteTable, text } from "drizzle-orm/sqlite-core";
import { caseProfile } from "./schema-library";
import { createdByRef, shopRef } from "./schema-refs";
import { createdAt, partOf } from "./schema-columns";

/** A photo's file in object storage: the shop it belongs to, its key there, its type and size. */
export const photoObject = () => ({
  organizationId: shopRef(),
  objectKey: text("object_key").notNull().unique(),
  contentType: text("content_type").notNull(),
  sizeBytes: integer("size_bytes").notNull(),
});

/** Whether a photo's file was checked: pending (upload URL issued), ready (checked), or refused with the reason. */
export const photoCheck = () => ({
  state: text("state").notNull().default("pending"),
  refusedReason: text("refused_reason"),
});

/**
 * A photo of a case profile's deck, traced over in the case form. The file lives in object storage under
 * objectKey; the row says whether it was checked (pending → ready, or refused with the reason). Shop staff
 * only: a customer never sees it. widthPx and heightPx are the upright size the browser read.
 */
export const casePhoto = sqliteTable(
  "case_photo",
  {
    id: text("id").primaryKey(),
    caseId: partOf("case_id", () => caseProfile.id),
    ...photoObject(),
    widthPx: integer("width_px"),
    heightPx: integer("height_px"),
    ...photoCheck(),
    /** The reference points the photo was scaled or squared up by (model/schemas/case-photos.ts), JSON; null until set. */
    referenceJson: text("reference_json"),
    createdAt: createdAt(),
    createdBy: createdByRef(),
  },
  (t) => [index("case_photo_case_idx").on(t.caseId, t.state)],
);

export type CasePhotoRow = typeof casePhoto.$inferSelect;
