import type { z } from "zod";
import { type FieldIssue, StudyValidationError } from "./errors";
import { type Study, StudySchema } from "./schema";

/** Field issues of a failed parse, each with its dotted path ("kits.0.boreMm") and the reason. */
export function fieldIssues(error: z.ZodError): FieldIssue[] {
  return error.issues.map((i) => ({ path: i.path.map(String).join("."), message: i.message }));
}

/** Parses unknown input into a Study, or returns every bad field by path. */
export function safeParseStudy(input: unknown): { ok: true; study: Study } | { ok: false; issues: FieldIssue[] } {
  const r = StudySchema.safeParse(input);
  return r.success ? { ok: true, study: r.data } : { ok: false, issues: fieldIssues(r.error) };
}

/** Parses unknown input into a Study; throws StudyValidationError listing every bad field. */
export function parseStudy(input: unknown): Study {
  const r = safeParseStudy(input);
  if (!r.ok) throw new StudyValidationError(r.issues);
  return r.study;
}
