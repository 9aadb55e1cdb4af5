// Request shapes of the jobs, photos, payments and consult API. No server-only code: the forms use them too.
import { z } from "zod";
import { BIDI_CONTROL } from "@/model/names";
import { JOB_STATUSES } from "@/model/job-status";
import { MAX_PHOTO_BYTES, PHOTO_TYPES } from "@/model/photo-files";

const text = (max: number, what: string) =>
  z
    .string({ error: `${what} must be text.` })
    .trim()
    .max(max, `Keep ${what.toLowerCase()} to ${max} characters or fewer.`)
    .refine((s) => !BIDI_CONTROL.test(s), { message: `Remove the invisible text-direction characters from ${what.toLowerCase()}.` });
const Id = z.string({ error: "Expected an id." }).min(1, "Expected an id.").max(100, "That is not an id.");

export const CURRENCIES = ["eur", "usd", "gbp", "chf", "sek", "nok", "dkk", "pln", "czk", "cad", "aud"] as const;

/** A deposit in the smallest currency unit (cents): a whole number, at most 100 000.00. */
export const AmountSchema = z
  .number({ error: "The deposit is a whole number of cents." })
  .int("The deposit is a whole number of cents (e.g. 5000 for 50.00).")
  .min(0, "The deposit cannot be negative.")
  .max(10_000_000, "A deposit above 100 000.00 is not taken through the card checkout.");

const customer = {
  customerName: text(120, "The customer's name").min(1, "Name the customer."),
  customerEmail: z.string({ error: "Give the customer's e-mail." }).trim().toLowerCase().pipe(z.email({ error: "That does not look like an e-mail address." })),
};

/** Why an owner plans a kit the study calls cannot-fit (kept with the plan). */
const OverrideReason = text(500, "The reason");

const base = {
  title: text(120, "The title").min(1, "Give the job a title (for example the engine and the customer)."),
  engineNumber: text(60, "The engine number").optional(),
  caseNumber: text(60, "The case number").optional(),
  caseVariant: text(120, "The case variant").optional(),
  studyId: Id.nullable().optional(),
  kitId: Id.nullable().optional(),
  depositAmount: AmountSchema.optional(),
  currency: z.enum(CURRENCIES, { error: "Choose a currency from the list." }).optional(),
  verifyToleranceMm: z.number({ error: "The tolerance is a number in mm." }).positive("The tolerance must be above zero.").max(2, "A tolerance above 2 mm is not a check.").optional(),
  notes: text(4000, "The notes").optional(),
};

/** A new job: for a customer (name and e-mail), or for the shop's own engine (no customer). */
export const JobCreateSchema = z
  .strictObject({
    ...base,
    ownEngine: z.boolean({ error: "Say whether the job is for the shop's own engine (true or false)." }).optional(),
    customerName: customer.customerName.optional(),
    customerEmail: customer.customerEmail.optional(),
    planOverrideReason: OverrideReason.optional(),
  })
  .superRefine((v, ctx) => {
    if (v.ownEngine) return;
    if (!v.customerName) ctx.addIssue({ code: "custom", path: ["customerName"], message: "Name the customer, or open the job for your own engine." });
    if (!v.customerEmail) ctx.addIssue({ code: "custom", path: ["customerEmail"], message: "Give the customer's e-mail, or open the job for your own engine." });
  });
export const JobPatchSchema = z
  .strictObject({ ...base, ...customer, planOverrideReason: OverrideReason })
  .partial()
  .extend({
    version: z.number({ error: "Send the version you last read." }).int("The version is a whole number.").min(1, "The version is a whole number from 1 up."),
  });
export type JobCreate = z.infer<typeof JobCreateSchema>;
export type JobPatch = z.infer<typeof JobPatchSchema>;

export const JobMoveSchema = z.strictObject({
  to: z.enum(JOB_STATUSES, { error: "Choose a status." }),
  reason: text(500, "The reason").optional(),
});

export const JobListQuerySchema = z.object({
  page: z.coerce.number({ error: "page is a whole number from 1." }).int("page is a whole number from 1.").min(1, "page is a whole number from 1.").max(100_000, "page is at most 100 000.").default(1),
  pageSize: z.coerce.number({ error: "pageSize is a whole number from 1 to 100." }).int("pageSize is a whole number from 1 to 100.").min(1, "pageSize is a whole number from 1 to 100.").max(100, "pageSize is a whole number from 1 to 100.").default(20),
  status: z.enum(JOB_STATUSES, { error: "Unknown status." }).optional(),
  q: z.string().trim().max(100).optional(),
  sort: z.enum(["updatedAt", "createdAt", "reference", "title", "customerName", "status"], { error: "Unknown sort field." }).optional(),
  dir: z.enum(["asc", "desc"]).optional(),
});
export type JobListQuery = z.infer<typeof JobListQuerySchema>;

// ── After-cut readings ───────────────────────────────────────────────────────────────────────────

export const TRIAL_FIT = ["goes-home", "binds", "not-tried"] as const;
export type TrialFit = (typeof TRIAL_FIT)[number];
export const TRIAL_FIT_LABEL: Record<TrialFit, string> = {
  "goes-home": "Goes fully home without force, turns by hand",
  binds: "Binds or does not go fully home",
  "not-tried": "Not tried yet",
};

const mm = (what: string) =>
  z
    .number({ error: `${what} is a number in mm.` })
    .positive(`${what} must be above zero.`)
    .max(1000, `${what} above 1 m cannot be right.`);

/** The readings taken after the cut, as the form and the API send them. */
export const AfterCutReadingsSchema = z.strictObject({
  cutDiameterMm: z.array(mm("A diameter reading")).min(1, "Take at least one diameter reading.").max(20, "Keep to 20 readings or fewer."),
  cutDepthMm: z.array(mm("A depth reading")).min(1, "Take at least one depth reading.").max(20, "Keep to 20 readings or fewer."),
  sealingLandMm: z
    .array(z.strictObject({ stud: z.string().trim().min(1, "Name the stud.").max(80, "A stud label has at most 80 characters."), valueMm: z.number({ error: "The sealing land is a number in mm." }).min(0, "A sealing land cannot be negative.").max(100, "A sealing land above 100 mm cannot be right.") }))
    .max(16),
  gasketStackMm: z.number({ error: "The gasket stack is a number in mm." }).min(0, "The gasket stack cannot be negative.").max(10, "A gasket stack above 10 mm cannot be right."),
  chipsCleaned: z.boolean({ error: "Say whether the crankcase was cleaned of chips." }),
  trialFit: z.enum(TRIAL_FIT, { error: "Choose the trial-fit result." }),
  notes: z.string().max(2000, "Keep the notes to 2000 characters or fewer.").optional(),
});
export type AfterCutReadings = z.infer<typeof AfterCutReadingsSchema>;

export const ReadingsBodySchema = AfterCutReadingsSchema;

export const QuestionSchema = z.strictObject({ text: text(2000, "The question").min(3, "Write your question (a few words at least).") });

export const PHOTO_KINDS = ["readings", "before", "after", "trial-fit", "other"] as const;

export const PhotoRequestSchema = z.strictObject({
  contentType: z.enum(PHOTO_TYPES, { error: "Only JPEG, PNG or WebP photos are accepted." }),
  sizeBytes: z.number({ error: "Send the file's size in bytes." }).int().min(1, "The file is empty.").max(MAX_PHOTO_BYTES, `Photos are limited to ${MAX_PHOTO_BYTES / 1024 / 1024} MB.`),
  caption: text(200, "The caption").optional(),
  kind: z.enum(PHOTO_KINDS, { error: "Choose what the photo shows." }).optional(),
  shared: z.boolean().optional(),
});
export const PhotoPatchSchema = z.strictObject({ shared: z.boolean().optional(), caption: text(200, "The caption").optional() });
