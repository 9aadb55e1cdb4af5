// The study's shapes: the create and update bodies, the row as the API returns it, and its history.
// Pure zod: no server-only code.
import { z } from "zod";
import { CutPlanSchema, ReadingsSchema, StudyLimitsSchema, StudyResultSchema, StudySchema } from "@/geometry";
import { IdSchema, NameSchema, NotesSchema, PersonSchema, VersionSchema, rowBase } from "./common";

// ── Create and update bodies ─────────────────────────────────────────────────────────────────────

const KitIdsSchema = z
  .array(IdSchema, { error: "List the study's kits by id." })
  .max(50, "A study compares at most 50 kits.")
  .superRefine((ids, ctx) => {
    const seen = new Set<string>();
    ids.forEach((id, i) => {
      if (seen.has(id)) ctx.addIssue({ code: "custom", path: [i], message: "This kit is already in the study." });
      seen.add(id);
    });
  });

export const StudyCreateSchema = z.strictObject({
  name: NameSchema,
  caseId: IdSchema,
  kitIds: KitIdsSchema,
  rigId: IdSchema.nullable().optional(),
  cut: CutPlanSchema.nullable().optional(),
  readings: ReadingsSchema.nullable().optional(),
  limits: StudyLimitsSchema.nullable().optional(),
  notes: NotesSchema.optional(),
});
export const StudyPatchSchema = z.strictObject({
  version: VersionSchema,
  name: NameSchema.optional(),
  caseId: IdSchema.optional(),
  kitIds: KitIdsSchema.optional(),
  rigId: IdSchema.nullable().optional(),
  cut: CutPlanSchema.nullable().optional(),
  readings: ReadingsSchema.nullable().optional(),
  limits: StudyLimitsSchema.nullable().optional(),
  /** The kit picked as the choice; one of kitIds, or null for none. */
  chosenKitId: IdSchema.nullable().optional(),
  notes: NotesSchema.optional(),
});

export type StudyCreate = z.infer<typeof StudyCreateSchema>;
export type StudyPatch = z.infer<typeof StudyPatchSchema>;

// ── Rows ─────────────────────────────────────────────────────────────────────────────────────────

export const StudyRowSchema = z.object({
  ...rowBase,
  caseId: z.string(),
  /** The case profile's name, for lists. */
  caseName: z.string(),
  kitIds: z.array(z.string()),
  rigId: z.string().nullable(),
  cut: CutPlanSchema.nullable(),
  readings: ReadingsSchema.nullable(),
  limits: StudyLimitsSchema.nullable(),
  chosenKitId: z.string().nullable(),
});

export type StudyRow = z.infer<typeof StudyRowSchema>;

export const HistoryItemSchema = z.object({ at: z.string(), by: PersonSchema, summary: z.string() });
export type HistoryItem = z.infer<typeof HistoryItemSchema>;

export { StudySchema, StudyResultSchema };
