// The request and response shapes of the library and studies API. The forms use these same schemas
// (through zodResolver), the route handlers parse every body with them, and the OpenAPI description is
// generated from them. No server-only code here: this module is imported by the browser too.
import { z } from "zod";
import {
  BoringRigSchema,
  CaseProfileSchema,
  CutPlanSchema,
  CylinderKitSchema,
  LimitsSchema,
  ReadingsSchema,
  StudyLimitsSchema,
  StudyResultSchema,
  StudySchema,
} from "@/geometry";

// ── Building blocks ──────────────────────────────────────────────────────────────────────────────

export const NameSchema = z
  .string({ error: "Give it a name." })
  .trim()
  .min(1, "Give it a name.")
  .max(80, "Keep the name to 80 characters or fewer.");
export const NotesSchema = z.string({ error: "Notes must be text." }).max(4000, "Keep the notes to 4000 characters or fewer.");
export const VersionSchema = z
  .number({ error: "Send the version you last read (a whole number)." })
  .int("The version is a whole number.")
  .min(1, "The version is a whole number from 1 up.");
export const IdSchema = z.string({ error: "Expected an id." }).min(1, "Expected an id.").max(100, "That is not an id.");
/** One reading's value as typed: a length in mm. */
export const ReadingValueMmSchema = z
  .number({ error: "A reading is a number in mm." })
  .positive("A reading must be above zero.")
  .max(10_000, "A reading above 10 m cannot be right.");

export const PersonSchema = z.object({ id: z.string(), name: z.string() });
/** A value as measured, with who measured it and when. */
export const ReadingSchema = z.object({ valueMm: z.number(), takenBy: PersonSchema, takenAt: z.string() });
export type Reading = z.infer<typeof ReadingSchema>;

/**
 * Runs the core's own schema on the completed object (with the fields the row holds apart, such as the
 * name), so the core's cross-field checks (duplicate stud labels, say) also hold for the form's data.
 * Only those checks are added: the field checks already ran on the shape.
 */
function coreChecks<T>(core: z.ZodType, complete: (data: T) => unknown) {
  return (data: T, ctx: z.RefinementCtx) => {
    const r = core.safeParse(complete(data));
    if (r.success) return;
    for (const issue of r.error.issues) {
      if (issue.code === "custom") ctx.addIssue({ code: "custom", path: issue.path, message: issue.message });
    }
  };
}

// ── Library data: the core's inputs without the fields the row holds ────────────────────────────

/** A copy of an object without one key. */
export function without<T extends object, K extends keyof T>(obj: T, key: K): Omit<T, K> {
  const copy = { ...obj };
  delete copy[key];
  return copy;
}

const caseShape = without(CaseProfileSchema.shape, "name");
/** A case profile as the core reads it, without its name (the row's name is the profile's name). */
export const CaseDataSchema = z.strictObject(caseShape).superRefine(coreChecks(CaseProfileSchema, (d: object) => ({ ...d, name: "case" })));
/** A cylinder kit as the core reads it, without id and name (the row's id and name are used). */
export const KitDataSchema = CylinderKitSchema.omit({ id: true, name: true });
/** A boring rig as the core reads it, without its name. */
export const RigDataSchema = BoringRigSchema.omit({ name: true });

export type CaseData = z.infer<typeof CaseDataSchema>;
export type CaseDataInput = z.input<typeof CaseDataSchema>;
export type KitData = z.infer<typeof KitDataSchema>;
export type KitDataInput = z.input<typeof KitDataSchema>;
export type RigData = z.infer<typeof RigDataSchema>;
export type RigDataInput = z.input<typeof RigDataSchema>;

const MouthReadingsSchema = z.array(ReadingValueMmSchema).max(50, "Keep to 50 readings or fewer.");

// ── Create and update bodies ─────────────────────────────────────────────────────────────────────

export const CaseCreateSchema = z.strictObject({
  name: NameSchema,
  notes: NotesSchema.optional(),
  data: CaseDataSchema,
  /** Mouth diameter readings; for a round mouth the smallest one is the diameter the core uses. */
  mouthReadingsMm: MouthReadingsSchema.optional(),
});
export const CasePatchSchema = z.strictObject({
  version: VersionSchema,
  name: NameSchema.optional(),
  notes: NotesSchema.optional(),
  data: CaseDataSchema.optional(),
  mouthReadingsMm: MouthReadingsSchema.optional(),
});

export const KitCreateSchema = z.strictObject({ name: NameSchema, notes: NotesSchema.optional(), data: KitDataSchema });
export const KitPatchSchema = z.strictObject({
  version: VersionSchema,
  name: NameSchema.optional(),
  notes: NotesSchema.optional(),
  data: KitDataSchema.optional(),
});

export const RigCreateSchema = z.strictObject({ name: NameSchema, notes: NotesSchema.optional(), data: RigDataSchema });
export const RigPatchSchema = z.strictObject({
  version: VersionSchema,
  name: NameSchema.optional(),
  notes: NotesSchema.optional(),
  data: RigDataSchema.optional(),
});

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

export type CaseCreate = z.infer<typeof CaseCreateSchema>;
export type CasePatch = z.infer<typeof CasePatchSchema>;
export type KitCreate = z.infer<typeof KitCreateSchema>;
export type KitPatch = z.infer<typeof KitPatchSchema>;
export type RigCreate = z.infer<typeof RigCreateSchema>;
export type RigPatch = z.infer<typeof RigPatchSchema>;
export type StudyCreate = z.infer<typeof StudyCreateSchema>;
export type StudyPatch = z.infer<typeof StudyPatchSchema>;

// ── Lists ────────────────────────────────────────────────────────────────────────────────────────

/** The fields each list sorts by. */
export const SORT_FIELDS = {
  cases: ["name", "createdAt", "updatedAt", "stockBoreMm", "strokeMm"],
  kits: ["name", "createdAt", "updatedAt", "boreMm", "price"],
  rigs: ["name", "createdAt", "updatedAt", "headDiameterMm"],
  studies: ["name", "createdAt", "updatedAt", "caseName"],
} as const;
export type Entity = keyof typeof SORT_FIELDS;
export type SortField<E extends Entity> = (typeof SORT_FIELDS)[E][number];

/** The query string of a list: page from 1, at most 100 a page, a sort field, a name filter, archived rows or live ones. */
export function listQuerySchema<E extends Entity>(entity: E) {
  const fields = SORT_FIELDS[entity] as readonly string[];
  return z.object({
    page: z.coerce.number({ error: "page is a whole number from 1." }).int("page is a whole number from 1.").min(1, "page is a whole number from 1.").max(1_000_000).default(1),
    pageSize: z.coerce
      .number({ error: "pageSize is a whole number from 1 to 100." })
      .int("pageSize is a whole number from 1 to 100.")
      .min(1, "pageSize is a whole number from 1 to 100.")
      .max(100, "pageSize is a whole number from 1 to 100.")
      .default(20),
    sort: z.enum(fields as [string, ...string[]], { error: `sort by one of: ${fields.join(", ")}.` }).optional(),
    dir: z.enum(["asc", "desc"], { error: "dir is asc or desc." }).optional(),
    q: z.string().max(200, "Keep the filter to 200 characters.").optional(),
    /** 0: live rows (the default); 1: archived rows only; all: both. */
    archived: z.enum(["0", "1", "all"], { error: "archived is 0, 1 or all." }).default("0"),
  });
}
export type ListQuery = z.infer<ReturnType<typeof listQuerySchema>>;

export function pageSchema<T extends z.ZodType>(item: T) {
  return z.object({ items: z.array(item), page: z.number().int(), pageSize: z.number().int(), total: z.number().int() });
}

// ── Rows as the API returns them ─────────────────────────────────────────────────────────────────

const rowBase = {
  id: z.string(),
  name: z.string(),
  version: z.number().int(),
  createdAt: z.string(),
  updatedAt: z.string(),
  createdBy: PersonSchema,
  archivedAt: z.string().nullable(),
  notes: z.string(),
};

export const CaseRowSchema = z.object({ ...rowBase, data: CaseProfileSchema, mouthReadingsMm: z.array(ReadingSchema) });
export const KitRowSchema = z.object({
  ...rowBase,
  data: KitDataSchema,
  readings: z.object({ skirtDiameter: z.array(ReadingSchema), skirtLength: z.array(ReadingSchema) }),
});
export const RigRowSchema = z.object({ ...rowBase, data: RigDataSchema });
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

export type CaseRow = z.infer<typeof CaseRowSchema>;
export type KitRow = z.infer<typeof KitRowSchema>;
export type RigRow = z.infer<typeof RigRowSchema>;
export type StudyRow = z.infer<typeof StudyRowSchema>;
export type Page<T> = { items: T[]; page: number; pageSize: number; total: number };

export const HistoryItemSchema = z.object({ at: z.string(), by: PersonSchema, summary: z.string() });
export type HistoryItem = z.infer<typeof HistoryItemSchema>;

// ── Import, export, settings, fit ────────────────────────────────────────────────────────────────

export const LIBRARY_CSV_KINDS = ["cases", "kits"] as const;
export type LibraryCsvKind = (typeof LIBRARY_CSV_KINDS)[number];
export const LibraryKindQuerySchema = z.object({ kind: z.enum(LIBRARY_CSV_KINDS, { error: "kind is cases or kits." }) });

export const MAX_CSV_CHARS = 1_000_000;
export const CsvImportSchema = z.strictObject({
  csv: z.string({ error: "Send the CSV text." }).max(MAX_CSV_CHARS, "The CSV is larger than 1 MB."),
  /** False: check every row and write nothing (a preview). True: write the good rows. */
  confirm: z.boolean({ error: "confirm is true or false." }),
});
export const CsvImportRowSchema = z.object({
  line: z.number().int(),
  ok: z.boolean(),
  errors: z.record(z.string(), z.string()).optional(),
  name: z.string().optional(),
});
export const CsvImportResultSchema = z.object({ rows: z.array(CsvImportRowSchema), written: z.number().int() });
export type CsvImportRow = z.infer<typeof CsvImportRowSchema>;
export type CsvImportResult = z.infer<typeof CsvImportResultSchema>;

export const UnitsSchema = z.enum(["mm", "in"], { error: "units is mm or in." });
export const SettingsPatchSchema = z.strictObject({
  version: VersionSchema,
  units: UnitsSchema.optional(),
  /** The shop's own limits; a limit left out takes its default. Replaces the shop's limits as a whole. */
  limits: StudyLimitsSchema.optional(),
});
export const SettingsSchema = z.object({
  settings: z.object({ units: UnitsSchema, limits: LimitsSchema, defaulted: z.array(z.string()) }),
  version: z.number().int(),
});
export type SettingsPatch = z.infer<typeof SettingsPatchSchema>;
export type ShopSettings = z.infer<typeof SettingsSchema>;

export { StudySchema, StudyResultSchema };

export const ErrorSchema = z.object({
  error: z.object({ code: z.string(), message: z.string(), fields: z.record(z.string(), z.string()).optional() }),
});
