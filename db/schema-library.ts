import { index, integer, sqliteTable, text, uniqueIndex, type SQLiteColumnBuilderBase } from "drizzle-orm/sqlite-core";
import { partOf } from "./schema-columns";
import { byWhomAndWhen, namedShopRow, rowStamps } from "./schema-refs";

// ── The shop's library and its studies ─────────────────────────────────────────────────────────
// Every row belongs to one shop, says who made it, and carries a version that each update must name
// (a stale version is refused, so no edit is silently overwritten). Shapes the core checks — a case
// profile, a kit, a rig, a cut plan — are kept as JSON validated by the core's zod schemas on the way in.

/**
 * A shelf of the library: each row a named entity of one shop, kept as JSON checked by the core's schema
 * (`data_json`), with the shelf's own columns beside it, listed by shop without the archived ones.
 */
function shelf<Name extends string, Columns extends Record<string, SQLiteColumnBuilderBase>>(name: Name, columns: Columns) {
  return sqliteTable(name, { ...namedShopRow(), dataJson: text("data_json").notNull(), ...columns, ...rowStamps() }, (t) => [
    index(`${name}_shop_idx`).on(t.organizationId, t.archivedAt),
  ]);
}

/** A case profile: deck, mouth, studs, pockets (JSON, without its name), and the mouth readings taken on it. */
export const caseProfile = shelf("case_profile", {
  /** Mouth diameter readings: [{ valueMm, takenById, takenByName, takenAt }]. */
  mouthReadingsJson: text("mouth_readings_json").notNull().default("[]"),
});

/** A cylinder kit: bore, skirt readings, studs, gaskets, price (JSON, without id and name), with who took each skirt reading. */
export const cylinderKit = shelf("cylinder_kit", {
  /** { skirtDiameter: Reading[], skirtLength: Reading[] }, one per value in the data's reading lists. */
  readingsJson: text("readings_json").notNull().default('{"skirtDiameter":[],"skirtLength":[]}'),
});

/** A boring rig: head, bit and its calibrated reach, grooves, shims, drill (JSON, without its name). */
export const boringRig = shelf("boring_rig", {});

/** A study: one case, its candidate kits (study_kit), a rig, the cut plan, the holder readings and the study's own limits. */
export const study = sqliteTable(
  "study",
  {
    ...namedShopRow(),
    caseId: text("case_id")
      .notNull()
      .references(() => caseProfile.id, { onDelete: "restrict" }),
    rigId: text("rig_id").references(() => boringRig.id, { onDelete: "restrict" }),
    cutJson: text("cut_json"),
    readingsJson: text("readings_json"),
    limitsJson: text("limits_json"),
    chosenKitId: text("chosen_kit_id"),
    /** A random token set by each update, so the statements of one update can tell they follow their own write. */
    writeId: text("write_id").notNull().default(""),
    ...rowStamps(),
  },
  (t) => [
    index("study_shop_idx").on(t.organizationId, t.archivedAt),
    index("study_case_idx").on(t.caseId),
    index("study_rig_idx").on(t.rigId),
  ],
);

/** The kits of a study, in the order the study lists them. */
export const studyKit = sqliteTable(
  "study_kit",
  {
    studyId: partOf("study_id", () => study.id),
    kitId: text("kit_id")
      .notNull()
      .references(() => cylinderKit.id, { onDelete: "restrict" }),
    position: integer("position").notNull(),
  },
  (t) => [uniqueIndex("study_kit_unique").on(t.studyId, t.kitId), index("study_kit_kit_idx").on(t.kitId)],
);

/** A study's history: who changed what, and when. */
export const studyEvent = sqliteTable(
  "study_event",
  {
    id: text("id").primaryKey(),
    studyId: partOf("study_id", () => study.id),
    ...byWhomAndWhen(),
    summary: text("summary").notNull(),
  },
  (t) => [index("study_event_study_idx").on(t.studyId, t.at)],
);

export type CaseProfileRow = typeof caseProfile.$inferSelect;
export type CylinderKitRow = typeof cylinderKit.$inferSelect;
export type BoringRigRow = typeof boringRig.$inferSelect;
export type StudyRow = typeof study.$inferSelect;
