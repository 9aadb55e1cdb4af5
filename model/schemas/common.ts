// The building blocks every request and row shape shares: names, notes, versions, ids, readings, list
// queries and pages, and the one error shape. Pure zod: imported by the browser, the data layer and the
// route handlers alike.
import { z } from "zod";
import { BIDI_CONTROL, BIDI_MESSAGE } from "@/model/names";

// ── Building blocks ──────────────────────────────────────────────────────────────────────────────

export const NameSchema = z
  .string({ error: "Give it a name." })
  .trim()
  .min(1, "Give it a name.")
  .max(80, "Keep the name to 80 characters or fewer.")
  .refine((s) => !BIDI_CONTROL.test(s), { message: BIDI_MESSAGE });
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

/** A copy of an object without one key. */
export function without<T extends object, K extends keyof T>(obj: T, key: K): Omit<T, K> {
  const copy = { ...obj };
  delete copy[key];
  return copy;
}

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
    page: z.coerce.number({ error: "page is a whole number from 1." }).int("page is a whole number from 1.").min(1, "page is a whole number from 1.").max(100_000, "page is at most 100 000.").default(1),
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

// ── Rows ─────────────────────────────────────────────────────────────────────────────────────────

/** The fields every library and study row carries. */
export const rowBase = {
  id: z.string(),
  name: z.string(),
  version: z.number().int(),
  createdAt: z.string(),
  updatedAt: z.string(),
  createdBy: PersonSchema,
  archivedAt: z.string().nullable(),
  notes: z.string(),
};

export type Page<T> = { items: T[]; page: number; pageSize: number; total: number };

export const ErrorSchema = z.object({
  error: z.object({ code: z.string(), message: z.string(), fields: z.record(z.string(), z.string()).optional() }),
});
