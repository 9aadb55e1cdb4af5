// The library's shapes: case profiles, cylinder kits and boring rigs as the forms send them, as the API
// returns them, and the CSV import's request and report. The forms use these same schemas (through
// zodResolver), the route handlers parse every body with them, and the OpenAPI description is generated
// from them. Pure zod: no server-only code.
import { z } from "zod";
import { BoringRigSchema, CaseProfileSchema, CylinderKitSchema } from "@/geometry";
import { MoneySchema } from "@/model/money";
import { NameSchema, NotesSchema, ReadingSchema, ReadingValueMmSchema, VersionSchema, rowBase, without } from "./common";

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

const caseShape = without(CaseProfileSchema.shape, "name");
/** A case profile as the core reads it, without its name (the row's name is the profile's name). */
export const CaseDataSchema = z.strictObject(caseShape).superRefine(coreChecks(CaseProfileSchema, (d: object) => ({ ...d, name: "case" })));
/**
 * A cylinder kit as the core reads it, without id and name (the row's id and name are used); its price is
 * money (integer minor units with the ISO 4217 code), which the core never reads.
 */
export const KitDataSchema = CylinderKitSchema.omit({ id: true, name: true, price: true }).extend({ price: MoneySchema.optional() });
/** A cylinder kit as the kit form checks it: the core's kit with the price as money. */
export const KitFormSchema = CylinderKitSchema.omit({ price: true }).extend({ price: MoneySchema.optional() });
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

/** An update body: any of the create body's fields, and the version the change was made from. */
const patchOf = <S extends z.ZodObject>(create: S) => create.partial().extend({ version: VersionSchema });

export const CaseCreateSchema = z.strictObject({
  name: NameSchema,
  notes: NotesSchema.optional(),
  data: CaseDataSchema,
  /** Mouth diameter readings; for a round mouth the smallest one is the diameter the core uses. */
  mouthReadingsMm: MouthReadingsSchema.optional(),
});
export const CasePatchSchema = patchOf(CaseCreateSchema);

export const KitCreateSchema = z.strictObject({ name: NameSchema, notes: NotesSchema.optional(), data: KitDataSchema });
export const KitPatchSchema = patchOf(KitCreateSchema);

export const RigCreateSchema = z.strictObject({ name: NameSchema, notes: NotesSchema.optional(), data: RigDataSchema });
export const RigPatchSchema = patchOf(RigCreateSchema);

export type CaseCreate = z.infer<typeof CaseCreateSchema>;
export type CasePatch = z.infer<typeof CasePatchSchema>;
export type KitCreate = z.infer<typeof KitCreateSchema>;
export type KitPatch = z.infer<typeof KitPatchSchema>;
export type RigCreate = z.infer<typeof RigCreateSchema>;
export type RigPatch = z.infer<typeof RigPatchSchema>;

// ── Rows as the API returns them ─────────────────────────────────────────────────────────────────

export const CaseRowSchema = z.object({ ...rowBase, data: CaseProfileSchema, mouthReadingsMm: z.array(ReadingSchema) });
export const KitRowSchema = z.object({
  ...rowBase,
  data: KitDataSchema,
  readings: z.object({ skirtDiameter: z.array(ReadingSchema), skirtLength: z.array(ReadingSchema) }),
});
export const RigRowSchema = z.object({ ...rowBase, data: RigDataSchema });
export type CaseRow = z.infer<typeof CaseRowSchema>;
export type KitRow = z.infer<typeof KitRowSchema>;
export type RigRow = z.infer<typeof RigRowSchema>;

// ── CSV import and export ────────────────────────────────────────────────────────────────────────

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
