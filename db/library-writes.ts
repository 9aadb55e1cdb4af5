import "server-only";
import { and, asc, eq, sql } from "drizzle-orm";
import type { CaseCreate, CasePatch, KitCreate, KitData, KitPatch } from "@/model/schemas";
import type { Caller } from "./access";
import { getDb } from "./client";
import { DataError, conflict } from "./errors";
import {
  WHAT,
  findRecord,
  getLibraryItem,
  libraryTable,
  parseKitReadings,
  toRow,
  type KitReadingsStored,
  type LibraryCreate,
  type LibraryKind,
  type LibraryPatch,
  type LibraryRow,
} from "./library";
import { assertStaff, isConstraintError, newId, notFound, parseStoredReadings, stampReadings } from "./rows";
import * as schema from "./schema";
import { deleteCaseProfileRows, removeCasePhotoFiles } from "./case-photos";

// Writing the shop's library: new rows (one at a time, or as statements for an import's batch), changes
// under the version the caller read, archiving, and deleting a row no study uses.

export type LibraryValues = {
  id: string;
  organizationId: string;
  name: string;
  notes: string;
  dataJson: string;
  version: number;
  createdAt: Date;
  updatedAt: Date;
  createdBy: string;
  mouthReadingsJson?: string;
  readingsJson?: string;
};

/** The column values a create body becomes (also used by imports, which write in a batch of their own). */
export function newLibraryValues<K extends LibraryKind>(caller: Caller, kind: K, body: LibraryCreate[K], now = Date.now()): LibraryValues {
  const at = new Date(now);
  const values = {
    id: newId(),
    organizationId: caller.shopId,
    name: body.name,
    notes: body.notes ?? "",
    dataJson: JSON.stringify(body.data),
    version: 1,
    createdAt: at,
    updatedAt: at,
    createdBy: caller.userId,
  };
  if (kind === "cases") {
    const b = body as CaseCreate;
    return { ...values, mouthReadingsJson: JSON.stringify(stampReadings(b.mouthReadingsMm ?? [], [], caller, now)) };
  }
  if (kind === "kits") {
    const d = (body as KitCreate).data;
    const readings: KitReadingsStored = {
      skirtDiameter: stampReadings(d.skirtDiameterReadingsMm, [], caller, now),
      skirtLength: stampReadings(d.skirtLengthReadingsMm, [], caller, now),
    };
    return { ...values, readingsJson: JSON.stringify(readings) };
  }
  return values;
}

const TABLE_NAMES: Record<LibraryKind, string> = { cases: "case_profile", kits: "cylinder_kit", rigs: "boring_rig" };

/** An insert of new library values as one statement, for imports that write many rows in one batch. */
export function insertLibraryStmt(kind: LibraryKind, v: LibraryValues): { sql: string; args: (string | number)[] } {
  const extra: [string, string] | null =
    kind === "cases" ? ["mouth_readings_json", v.mouthReadingsJson ?? "[]"] : kind === "kits" ? ["readings_json", v.readingsJson ?? "{}"] : null;
  return {
    sql: `insert into ${TABLE_NAMES[kind]} (id, organization_id, name, notes, data_json, ${extra ? `${extra[0]}, ` : ""}version, created_at, updated_at, created_by)
          values (?, ?, ?, ?, ?, ${extra ? "?, " : ""}1, ?, ?, ?)`,
    args: [v.id, v.organizationId, v.name, v.notes, v.dataJson, ...(extra ? [extra[1]] : []), v.createdAt.getTime(), v.updatedAt.getTime(), v.createdBy],
  };
}

/** Adds a row to the shop's library. */
export async function createLibraryItem<K extends LibraryKind>(caller: Caller, kind: K, body: LibraryCreate[K]): Promise<LibraryRow[K]> {
  assertStaff(caller);
  const db = await getDb();
  const values = newLibraryValues(caller, kind, body);
  await db.insert(libraryTable(kind)).values(values as typeof schema.boringRig.$inferInsert);
  return getLibraryItem(caller, kind, values.id);
}

/** Changes a row when the caller names its current version; a stale version is refused with 409. */
export async function updateLibraryItem<K extends LibraryKind>(caller: Caller, kind: K, id: string, patch: LibraryPatch[K]): Promise<LibraryRow[K]> {
  assertStaff(caller);
  const found = await findRecord(kind, caller.shopId, id);
  if (!found) throw notFound(WHAT[kind]);
  const current = found.record;
  if (current.version !== patch.version) throw conflict();

  const now = Date.now();
  const set: Record<string, unknown> = {};
  if (patch.name !== undefined) set.name = patch.name;
  if (patch.notes !== undefined) set.notes = patch.notes;
  if (patch.data !== undefined) set.dataJson = JSON.stringify(patch.data);
  if (kind === "cases") {
    const p = patch as CasePatch;
    if (p.mouthReadingsMm !== undefined) {
      const previous = parseStoredReadings((current as schema.CaseProfileRow).mouthReadingsJson);
      set.mouthReadingsJson = JSON.stringify(stampReadings(p.mouthReadingsMm, previous, caller, now));
    }
  }
  if (kind === "kits" && patch.data !== undefined) {
    const d = (patch as KitPatch).data as KitData;
    const previous = parseKitReadings((current as schema.CylinderKitRow).readingsJson);
    const readings: KitReadingsStored = {
      skirtDiameter: stampReadings(d.skirtDiameterReadingsMm, previous.skirtDiameter, caller, now),
      skirtLength: stampReadings(d.skirtLengthReadingsMm, previous.skirtLength, caller, now),
    };
    set.readingsJson = JSON.stringify(readings);
  }
  if (Object.keys(set).length === 0) return toRow(kind, current, found.creatorName);

  const db = await getDb();
  const t = libraryTable(kind);
  const result = await db
    .update(t)
    .set({ ...set, version: sql`${t.version} + 1`, updatedAt: new Date(now) })
    .where(and(eq(t.id, id), eq(t.organizationId, caller.shopId), eq(t.version, patch.version)));
  if (result.rowsAffected === 0) throw conflict();
  return getLibraryItem(caller, kind, id);
}

/** Archives or restores a row (archived rows leave the lists but stay usable by the studies that have them). */
export async function setLibraryArchived<K extends LibraryKind>(caller: Caller, kind: K, id: string, archived: boolean): Promise<LibraryRow[K]> {
  assertStaff(caller);
  const found = await findRecord(kind, caller.shopId, id);
  if (!found) throw notFound(WHAT[kind]);
  if ((found.record.archivedAt !== null) === archived) return toRow(kind, found.record, found.creatorName);
  const db = await getDb();
  const t = libraryTable(kind);
  const now = new Date();
  await db
    .update(t)
    .set({ archivedAt: archived ? now : null, version: sql`${t.version} + 1`, updatedAt: now })
    .where(and(eq(t.id, id), eq(t.organizationId, caller.shopId)));
  return getLibraryItem(caller, kind, id);
}

/** The studies (live or archived) that use a library row, by name. */
export async function studiesUsing(kind: LibraryKind, shopId: string, id: string): Promise<string[]> {
  const db = await getDb();
  const s = schema.study;
  if (kind === "kits") {
    const rows = await db
      .selectDistinct({ name: s.name })
      .from(schema.studyKit)
      .innerJoin(s, eq(s.id, schema.studyKit.studyId))
      .where(and(eq(schema.studyKit.kitId, id), eq(s.organizationId, shopId)))
      .orderBy(asc(s.name));
    return rows.map((r) => r.name);
  }
  const column = kind === "cases" ? s.caseId : s.rigId;
  const rows = await db.select({ name: s.name }).from(s).where(and(eq(column, id), eq(s.organizationId, shopId))).orderBy(asc(s.name));
  return rows.map((r) => r.name);
}

export function inUseMessage(what: string, names: readonly string[]): string {
  const shown = names.slice(0, 10).join(", ");
  const more = names.length > 10 ? ` and ${names.length - 10} more` : "";
  return `This ${what} cannot be deleted: it is used by the studies: ${shown}${more}. Remove it from them, or archive it instead.`;
}

/** Deletes a row no study uses; a row in use is refused with 409 naming the studies. */
export async function deleteLibraryItem(caller: Caller, kind: LibraryKind, id: string): Promise<void> {
  assertStaff(caller);
  const found = await findRecord(kind, caller.shopId, id);
  if (!found) throw notFound(WHAT[kind]);
  const users = await studiesUsing(kind, caller.shopId, id);
  if (users.length > 0) throw new DataError("in_use", inUseMessage(WHAT[kind], users));
  const db = await getDb();
  const t = libraryTable(kind);
  // A case profile's photos: their rows go in the case's transaction, their files only after it committed.
  let photoFiles: string[] = [];
  try {
    if (kind === "cases") photoFiles = await deleteCaseProfileRows(db, caller.shopId, id);
    else await db.delete(t).where(and(eq(t.id, id), eq(t.organizationId, caller.shopId)));
  } catch (error) {
    // A study took the row up between the check and the delete: the foreign key refused it.
    if (isConstraintError(error)) throw new DataError("in_use", inUseMessage(WHAT[kind], await studiesUsing(kind, caller.shopId, id)));
    throw error;
  }
  await removeCasePhotoFiles(photoFiles);
}
