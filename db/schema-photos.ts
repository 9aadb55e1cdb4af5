import { index, integer, sqliteTable, text } from "drizzle-orm/sqlite-core";
import { caseProfile } from "./schema-library";
import { createdByRef, shopRef } from "./schema-refs";
import { createdAt } from "./schema-time";

/**
 * A photo of a case profile's deck, traced over in the case form. The file lives in object storage under
 * objectKey; the row says whether it was checked (pending → ready, or refused with the reason). Shop staff
 * only: a customer never sees it. widthPx and heightPx are the upright size the browser read.
 */
export const casePhoto = sqliteTable(
  "case_photo",
  {
    id: text("id").primaryKey(),
    caseId: text("case_id")
      .notNull()
      .references(() => caseProfile.id, { onDelete: "cascade" }),
    organizationId: shopRef(),
    objectKey: text("object_key").notNull().unique(),
    contentType: text("content_type").notNull(),
    sizeBytes: integer("size_bytes").notNull(),
    widthPx: integer("width_px"),
    heightPx: integer("height_px"),
    state: text("state").notNull().default("pending"),
    refusedReason: text("refused_reason"),
    /** The reference points the photo was scaled or squared up by (model/schemas/case-photos.ts), JSON; null until set. */
    referenceJson: text("reference_json"),
    createdAt: createdAt(),
    createdBy: createdByRef(),
  },
  (t) => [index("case_photo_case_idx").on(t.caseId, t.state)],
);

export type CasePhotoRow = typeof casePhoto.$inferSelect;
