import "server-only";
import { and, asc, count, desc, eq, inArray, isNotNull, isNull, sql, type SQL } from "drizzle-orm";
import type { SQLiteColumn } from "drizzle-orm/sqlite-core";
import type { CaseProfile } from "@/geometry";
import type {
  CaseCreate,
  CaseData,
  CasePatch,
  CaseRow,
  KitCreate,
  KitData,
  KitPatch,
  KitRow,
  ListQuery,
  Page,
  RigCreate,
  RigData,
  RigPatch,
  RigRow,
} from "@/model/schemas";
import type { Caller } from "./access";
import { getDb } from "./client";
import { DataError, conflict } from "./errors";
import { assertStaff, isConstraintError, iso, newId, notFound, parseStoredReadings, readingOut, stampReadings, type StoredReading } from "./rows";
import * as schema from "./schema";

// The shop's library: case profiles, cylinder kits and boring rigs. Every function takes the caller,
// checks the role, and reads or writes only rows of the caller's active shop.

export type LibraryKind = "cases" | "kits" | "rigs";
export type LibraryRow = { cases: CaseRow; kits: KitRow; rigs: RigRow };
export type LibraryCreate = { cases: CaseCreate; kits: KitCreate; rigs: RigCreate };
export type LibraryPatch = { cases: CasePatch; kits: KitPatch; rigs: RigPatch };

const TABLES = { cases: schema.caseProfile, kits: schema.cylinderKit, rigs: schema.boringRig } as const;
export const WHAT: Record<LibraryKind, string> = { cases: "case profile", kits: "cylinder kit", rigs: "boring rig" };

// The three tables share their common columns; this view of them is what the generic code touches.
type Common = typeof schema.boringRig;
const common = (kind: LibraryKind) => TABLES[kind] as unknown as Common;

type AnyRecord = schema.CaseProfileRow | schema.CylinderKitRow | schema.BoringRigRow;
type KitReadingsStored = { skirtDiameter: StoredReading[]; skirtLength: StoredReading[] };

function parseKitReadings(json: string): KitReadingsStored {
  try {
    const v = JSON.parse(json) as Partial<KitReadingsStored>;
    return { skirtDiameter: v.skirtDiameter ?? [], skirtLength: v.skirtLength ?? [] };
  } catch {
    return { skirtDiameter: [], skirtLength: [] };
  }
}

function base(r: AnyRecord, creatorName: string) {
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

/** A stored row as the API shows it. */
export function toRow<K extends LibraryKind>(kind: K, r: AnyRecord, creatorName: string): LibraryRow[K] {
  const data = JSON.parse(r.dataJson) as Record<string, unknown>;
  if (kind === "cases") {
    const c = r as schema.CaseProfileRow;
    const row: CaseRow = { ...base(r, creatorName), data: { ...(data as CaseData), name: r.name }, mouthReadingsMm: parseStoredReadings(c.mouthReadingsJson).map(readingOut) };
    return row as LibraryRow[K];
  }
  if (kind === "kits") {
    const readings = parseKitReadings((r as schema.CylinderKitRow).readingsJson);
    const row: KitRow = {
      ...base(r, creatorName),
      data: data as KitData,
      readings: { skirtDiameter: readings.skirtDiameter.map(readingOut), skirtLength: readings.skirtLength.map(readingOut) },
    };
    return row as LibraryRow[K];
  }
  const row: RigRow = { ...base(r, creatorName), data: data as RigData };
  return row as LibraryRow[K];
}

/**
 * A case row as the core reads it. For a round mouth with readings, the diameter is the smallest reading:
 * the tightest spot is the one the skirt must pass.
 */
export function assembleCase(r: schema.CaseProfileRow): CaseProfile {
  const data = JSON.parse(r.dataJson) as CaseData;
  const readings = parseStoredReadings(r.mouthReadingsJson);
  const profile: CaseProfile = { ...data, name: r.name };
  if (profile.mouth.outline.kind === "circle" && readings.length > 0) {
    const smallest = Math.min(...readings.map((x) => x.valueMm));
    profile.mouth = { ...profile.mouth, outline: { ...profile.mouth.outline, diameterMm: smallest } };
  }
  return profile;
}

function sortColumn(kind: LibraryKind, sort: string | undefined): SQL | SQLiteColumn {
  const t = common(kind);
  switch (sort) {
    case "name":
      return sql`lower(${t.name})`;
    case "createdAt":
      return t.createdAt;
    case "updatedAt":
    case undefined:
      return t.updatedAt;
    default:
      // A numeric field of the row's data (the list query only lets known ones through).
      return sql`json_extract(${t.dataJson}, ${`$.${sort}`})`;
  }
}

export function archivedFilter(column: SQLiteColumn, archived: ListQuery["archived"]): SQL | undefined {
  if (archived === "1") return isNotNull(column);
  if (archived === "all") return undefined;
  return isNull(column);
}

/** A case-insensitive substring match on the name. */
export function nameFilter(column: SQLiteColumn, q: string | undefined): SQL | undefined {
  const needle = q?.trim();
  return needle ? sql`instr(lower(${column}), lower(${needle})) > 0` : undefined;
}

/** One page of the shop's rows of a kind, sorted and filtered. */
export async function listLibrary<K extends LibraryKind>(caller: Caller, kind: K, query: ListQuery): Promise<Page<LibraryRow[K]>> {
  assertStaff(caller);
  const db = await getDb();
  const t = common(kind);
  const where = and(eq(t.organizationId, caller.shopId), archivedFilter(t.archivedAt, query.archived), nameFilter(t.name, query.q));
  const dir = query.dir ?? (query.sort ? "asc" : "desc");
  const order = dir === "asc" ? asc(sortColumn(kind, query.sort)) : desc(sortColumn(kind, query.sort));
  const [totalRow] = await db.select({ n: count() }).from(t).where(where);
  const rows = await db
    .select({ row: TABLES[kind] as unknown as Common, creatorName: schema.user.name })
    .from(t)
    .innerJoin(schema.user, eq(schema.user.id, t.createdBy))
    .where(where)
    .orderBy(order, asc(t.id))
    .limit(query.pageSize)
    .offset((query.page - 1) * query.pageSize);
  return {
    items: rows.map((r) => toRow(kind, r.row as AnyRecord, r.creatorName)),
    page: query.page,
    pageSize: query.pageSize,
    total: totalRow?.n ?? 0,
  };
}

async function findRecord(kind: LibraryKind, shopId: string, id: string) {
  const db = await getDb();
  const t = common(kind);
  const [found] = await db
    .select({ row: TABLES[kind] as unknown as Common, creatorName: schema.user.name })
    .from(t)
    .innerJoin(schema.user, eq(schema.user.id, t.createdBy))
    .where(and(eq(t.id, id), eq(t.organizationId, shopId)))
    .limit(1);
  return found ? { record: found.row as AnyRecord, creatorName: found.creatorName } : null;
}

/** One row of the shop's library, or 404. */
export async function getLibraryItem<K extends LibraryKind>(caller: Caller, kind: K, id: string): Promise<LibraryRow[K]> {
  assertStaff(caller);
  const found = await findRecord(kind, caller.shopId, id);
  if (!found) throw notFound(WHAT[kind]);
  return toRow(kind, found.record, found.creatorName);
}

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
  await db.insert(TABLES[kind] as unknown as Common).values(values as typeof schema.boringRig.$inferInsert);
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
  const t = common(kind);
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
  const t = common(kind);
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
  const t = common(kind);
  try {
    await db.delete(t).where(and(eq(t.id, id), eq(t.organizationId, caller.shopId)));
  } catch (error) {
    // A study took the row up between the check and the delete: the foreign key refused it.
    if (isConstraintError(error)) throw new DataError("in_use", inUseMessage(WHAT[kind], await studiesUsing(kind, caller.shopId, id)));
    throw error;
  }
}

/** Rows of a kind by id, of one shop only. */
export async function recordsById<K extends LibraryKind>(kind: K, shopId: string, ids: readonly string[]) {
  if (ids.length === 0) return new Map<string, AnyRecord>();
  const db = await getDb();
  const t = common(kind);
  const rows = await db
    .select()
    .from(TABLES[kind] as unknown as Common)
    .where(and(eq(t.organizationId, shopId), inArray(t.id, [...ids])));
  return new Map(rows.map((r) => [r.id, r as AnyRecord]));
}

