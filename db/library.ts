import "server-only";
import { and, asc, count, desc, eq, inArray, isNotNull, isNull, sql, type SQL } from "drizzle-orm";
import type { SQLiteColumn } from "drizzle-orm/sqlite-core";
import { z } from "zod";
import {
  CaseDataSchema,
  KitDataSchema,
  RigDataSchema,
  type CaseCreate,
  type CasePatch,
  type CaseRow,
  type KitCreate,
  type KitPatch,
  type KitRow,
  type ListQuery,
  type Page,
  type RigCreate,
  type RigPatch,
  type RigRow,
} from "@/model/schemas";
import type { Caller } from "./access";
import { getDb } from "./client";
import { StoredReadingSchema, assertStaff, notFound, parseStoredReadings, readColumn, readingOut, rowBaseOf, storedData, type StoredReading } from "./rows";
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
export const libraryTable = (kind: LibraryKind) => TABLES[kind] as unknown as Common;

type AnyRecord = schema.CaseProfileRow | schema.CylinderKitRow | schema.BoringRigRow;
export type KitReadingsStored = { skirtDiameter: StoredReading[]; skirtLength: StoredReading[] };

const KitReadingsStoredSchema = z.object({ skirtDiameter: z.array(StoredReadingSchema).default([]), skirtLength: z.array(StoredReadingSchema).default([]) });

export function parseKitReadings(json: string): KitReadingsStored {
  return readColumn(KitReadingsStoredSchema, json, { skirtDiameter: [], skirtLength: [] }, "a kit's skirt readings");
}

/** A stored row as the API shows it. */
export function toRow<K extends LibraryKind>(kind: K, r: AnyRecord, creatorName: string): LibraryRow[K] {
  if (kind === "cases") {
    const c = r as schema.CaseProfileRow;
    const data = storedData(CaseDataSchema, r.dataJson, "a case profile");
    const row: CaseRow = { ...rowBaseOf(r, creatorName), data: { ...data, name: r.name }, mouthReadingsMm: parseStoredReadings(c.mouthReadingsJson).map(readingOut) };
    return row as LibraryRow[K];
  }
  if (kind === "kits") {
    const readings = parseKitReadings((r as schema.CylinderKitRow).readingsJson);
    const row: KitRow = {
      ...rowBaseOf(r, creatorName),
      data: storedData(KitDataSchema, r.dataJson, "a cylinder kit"),
      readings: { skirtDiameter: readings.skirtDiameter.map(readingOut), skirtLength: readings.skirtLength.map(readingOut) },
    };
    return row as LibraryRow[K];
  }
  const row: RigRow = { ...rowBaseOf(r, creatorName), data: storedData(RigDataSchema, r.dataJson, "a boring rig") };
  return row as LibraryRow[K];
}

function sortColumn(kind: LibraryKind, sort: string | undefined): SQL | SQLiteColumn {
  const t = libraryTable(kind);
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
  const t = libraryTable(kind);
  const where = and(eq(t.organizationId, caller.shopId), archivedFilter(t.archivedAt, query.archived), nameFilter(t.name, query.q));
  const dir = query.dir ?? (query.sort ? "asc" : "desc");
  const order = dir === "asc" ? asc(sortColumn(kind, query.sort)) : desc(sortColumn(kind, query.sort));
  // The page and the total in one statement; a page past the end has no row to carry the total.
  const rows = await db
    .select({ row: libraryTable(kind), creatorName: schema.user.name, total: sql<number>`count(*) over ()` })
    .from(t)
    .innerJoin(schema.user, eq(schema.user.id, t.createdBy))
    .where(where)
    .orderBy(order, asc(t.id))
    .limit(query.pageSize)
    .offset((query.page - 1) * query.pageSize);
  const total = rows[0]?.total ?? (query.page > 1 ? ((await db.select({ n: count() }).from(t).where(where))[0]?.n ?? 0) : 0);
  return {
    items: rows.map((r) => toRow(kind, r.row as AnyRecord, r.creatorName)),
    page: query.page,
    pageSize: query.pageSize,
    total,
  };
}

export async function findRecord(kind: LibraryKind, shopId: string, id: string) {
  const db = await getDb();
  const t = libraryTable(kind);
  const [found] = await db
    .select({ row: libraryTable(kind), creatorName: schema.user.name })
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

/** Rows of a kind by id, of one shop only. */
export async function recordsById<K extends LibraryKind>(kind: K, shopId: string, ids: readonly string[]) {
  if (ids.length === 0) return new Map<string, AnyRecord>();
  const db = await getDb();
  const t = libraryTable(kind);
  const rows = await db
    .select()
    .from(libraryTable(kind))
    .where(and(eq(t.organizationId, shopId), inArray(t.id, [...ids])));
  return new Map(rows.map((r) => [r.id, r as AnyRecord]));
}


/** The API rows of a kind by id, of one shop only (for assembling a study and seeding the page's cache). */
export async function libraryRowsById<K extends LibraryKind>(kind: K, shopId: string, ids: readonly string[]): Promise<Map<string, LibraryRow[K]>> {
  if (ids.length === 0) return new Map();
  const db = await getDb();
  const t = libraryTable(kind);
  const rows = await db
    .select({ row: t, creatorName: schema.user.name })
    .from(t)
    .innerJoin(schema.user, eq(schema.user.id, t.createdBy))
    .where(and(eq(t.organizationId, shopId), inArray(t.id, [...ids])));
  return new Map(rows.map((r) => [r.row.id, toRow(kind, r.row as AnyRecord, r.creatorName)]));
}
