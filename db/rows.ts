import "server-only";
import { randomUUID } from "node:crypto";
import { z } from "zod";
import { AccessError, type Caller } from "./access";
import { getClient } from "./client";
import { conflict } from "./errors";
import { SHOP_STAFF } from "./roles";

// Helpers shared by the library and the studies: who may work on them, ids, times and reading stamps.

/** Throws 403 unless the caller works on the shop's data (owner or builder). */
export function assertStaff(caller: Caller): void {
  if (!SHOP_STAFF.includes(caller.role)) throw new AccessError("forbidden", "Your role in this shop does not allow this.");
}

/** The 404 for a row that does not exist or belongs to another shop: the two are not told apart. */
export function notFound(what: string): AccessError {
  return new AccessError("not_found", `No ${what} with this id in your shop.`);
}

export const newId = (): string => randomUUID();

export const iso = (d: Date | number | null | undefined): string | null =>
  d === null || d === undefined ? null : new Date(d).toISOString();

/** The fields every library and study row shows the same way: id, name, version, times, creator, notes. */
export function rowBaseOf(
  r: { id: string; name: string; version: number; createdAt: Date; updatedAt: Date; createdBy: string; archivedAt: Date | null; notes: string },
  creatorName: string,
) {
  return {
    id: r.id,
    name: r.name,
    version: r.version,
    createdAt: iso(r.createdAt) ?? "",
    updatedAt: iso(r.updatedAt) ?? "",
    createdBy: { id: r.createdBy, name: creatorName },
    archivedAt: iso(r.archivedAt),
    notes: r.notes,
  };
}

/** A reading as stored: the value, and who took it when. */
export const StoredReadingSchema = z.object({ valueMm: z.number(), takenById: z.string(), takenByName: z.string(), takenAt: z.number() });
export type StoredReading = z.infer<typeof StoredReadingSchema>;

/**
 * Reads a JSON column through its schema. A damaged column (not JSON, or not the shape) is logged and read
 * as the fallback: it holds readings or plans the data layer wrote itself, and one damaged row must not
 * keep the rest of a list or a study from showing.
 */
export function readColumn<T>(schema: z.ZodType<T>, json: string | null | undefined, fallback: T, what: string): T {
  if (json === null || json === undefined || json === "") return fallback;
  let value: unknown;
  try {
    value = JSON.parse(json);
  } catch (error) {
    console.warn(`${what}: the stored column is not JSON; it is read as empty.`, error);
    return fallback;
  }
  const r = schema.safeParse(value);
  if (r.success) return r.data;
  console.warn(`${what}: the stored column does not have the expected shape; it is read as empty.`, r.error.issues.slice(0, 3));
  return fallback;
}

/** Reads a stored reading list, tolerating an empty or damaged column. */
export function parseStoredReadings(json: string | null | undefined): StoredReading[] {
  return readColumn(z.array(StoredReadingSchema), json, [], "stored readings");
}

/**
 * Stamps a list of values: a value that was already there keeps the stamp of whoever took it; a new value is
 * stamped with the caller and now. Equal values pair off one to one, in order.
 */
export function stampReadings(values: readonly number[], previous: readonly StoredReading[], caller: Caller, now: number): StoredReading[] {
  const pool = [...previous];
  return values.map((valueMm) => {
    const i = pool.findIndex((p) => Math.abs(p.valueMm - valueMm) < 1e-9);
    if (i >= 0) return pool.splice(i, 1)[0];
    return { valueMm, takenById: caller.userId, takenByName: caller.name, takenAt: now };
  });
}

/** A stored reading as the API shows it. */
export function readingOut(r: StoredReading) {
  return { valueMm: r.valueMm, takenBy: { id: r.takenById, name: r.takenByName }, takenAt: new Date(r.takenAt).toISOString() };
}

/**
 * Reads a row's data column through the schema its writes were checked with. Data that no longer reads is
 * a defect of the data layer, not something a caller sent: it is thrown as such (logged, answered 500).
 */
export function storedData<T>(schema: z.ZodType<T>, json: string, what: string): T {
  const r = schema.safeParse(JSON.parse(json));
  if (r.success) return r.data;
  throw new Error(`${what}: the stored data does not read as written: ${r.error.issues.slice(0, 3).map((i) => `${i.path.join(".")}: ${i.message}`).join("; ")}`);
}

/** Each failing field of a zod error by its dotted path ("kits.0.boreMm"), with the reason. */
export function fieldsOf(error: z.ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) fields[issue.path.map(String).join(".") || "(body)"] ??= issue.message;
  return fields;
}

/** One SQL statement of a batch. */
export type Stmt = { sql: string; args: (string | number | null)[] };

/** Whether a database error is a constraint refusal (a foreign key, a unique index). */
export function isConstraintError(error: unknown): boolean {
  const e = error as { code?: string; message?: string; cause?: unknown } | null;
  return /CONSTRAINT/i.test(`${e?.code ?? ""} ${e?.message ?? ""} ${String(e?.cause ?? "")}`);
}

/**
 * Runs statements as one write transaction, all or nothing. A batch holds the connection only while its
 * statements run, so other requests are never refused meanwhile (an interactive transaction would hold the
 * file database's single connection across awaits).
 */
export async function runBatch(stmts: Stmt[]) {
  const client = await getClient();
  try {
    return await client.batch(stmts, "write");
  } catch (error) {
    // A row the batch refers to was deleted between the check and the write: the foreign keys refused it.
    if (isConstraintError(error)) throw conflict();
    throw error;
  }
}
