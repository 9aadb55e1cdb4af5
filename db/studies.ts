import "server-only";
import type { SQLiteColumn } from "drizzle-orm/sqlite-core";
import { and, asc, count, desc, eq, inArray, sql, type SQL } from "drizzle-orm";
import { CutPlanSchema, GeometryError, ReadingsSchema, StudyLimitsSchema, evaluateStudy, type Study, type StudyResult } from "@/geometry";
import type { CaseRow, HistoryItem, KitRow, ListQuery, Page, RigRow, StudyRow } from "@/model/schemas";
import { assembleStudy, checkStudy, type AssembledStudy } from "@/model/study-assembly";
import type { Caller } from "./access";
import { getClient, getDb, type Db } from "./client";
import { DataError } from "./errors";
import { archivedFilter, libraryRowsById, nameFilter } from "./library";
import { assertStaff, fieldsOf, iso, notFound, readColumn, rowBaseOf } from "./rows";
import * as schema from "./schema";
import { shopLimits } from "./settings";
import type { StudySnapshot } from "@/model/study-history";

// Studies: one case profile, its candidate kits, a rig, the cut plan, the holder readings and the
// study's own limits. Reading them, assembling them into the core's Study (with the one assembler the
// browser and the fit script's files share) and evaluating them; writes are in study-writes.ts.

const s = schema.study;

export type Loaded = { record: schema.StudyRow; creatorName: string; caseName: string; kitIds: string[] };

export function toStudyRow(l: Loaded): StudyRow {
  const r = l.record;
  return {
    ...rowBaseOf(r, l.creatorName),
    caseId: r.caseId,
    caseName: l.caseName,
    kitIds: l.kitIds,
    rigId: r.rigId,
    cut: readColumn(CutPlanSchema.nullable(), r.cutJson, null, "a study's cut plan"),
    readings: readColumn(ReadingsSchema.nullable(), r.readingsJson, null, "a study's holder readings"),
    limits: readColumn(StudyLimitsSchema.nullable(), r.limitsJson, null, "a study's limits"),
    chosenKitId: r.chosenKitId,
  };
}

export function snapshotOf(row: StudyRow): StudySnapshot {
  return {
    name: row.name,
    notes: row.notes,
    caseId: row.caseId,
    kitIds: row.kitIds,
    rigId: row.rigId,
    cut: row.cut,
    readings: row.readings,
    limits: row.limits,
    chosenKitId: row.chosenKitId,
  };
}

async function kitIdsOf(studyIds: readonly string[]): Promise<Map<string, string[]>> {
  const out = new Map<string, string[]>(studyIds.map((id) => [id, []]));
  if (studyIds.length === 0) return out;
  const db = await getDb();
  const rows = await db
    .select({ studyId: schema.studyKit.studyId, kitId: schema.studyKit.kitId })
    .from(schema.studyKit)
    .where(inArray(schema.studyKit.studyId, [...studyIds]))
    .orderBy(asc(schema.studyKit.studyId), asc(schema.studyKit.position));
  for (const r of rows) out.get(r.studyId)?.push(r.kitId);
  return out;
}

const selection = { record: s, creatorName: schema.user.name, caseName: schema.caseProfile.name };

export async function loadStudy(shopId: string, id: string): Promise<Loaded | null> {
  const db = await getDb();
  const [found] = await db
    .select(selection)
    .from(s)
    .innerJoin(schema.user, eq(schema.user.id, s.createdBy))
    .innerJoin(schema.caseProfile, eq(schema.caseProfile.id, s.caseId))
    .where(and(eq(s.id, id), eq(s.organizationId, shopId)))
    .limit(1);
  if (!found) return null;
  const kits = await kitIdsOf([id]);
  return { ...found, kitIds: kits.get(id) ?? [] };
}

export async function loadStudyOr404(caller: Caller, id: string): Promise<Loaded> {
  assertStaff(caller);
  const found = await loadStudy(caller.shopId, id);
  if (!found) throw notFound("study");
  return found;
}

function sortColumn(sort: string | undefined): SQL | SQLiteColumn {
  switch (sort) {
    case "name":
      return sql`lower(${s.name})`;
    case "caseName":
      return sql`lower(${schema.caseProfile.name})`;
    case "createdAt":
      return s.createdAt;
    default:
      return s.updatedAt;
  }
}

/** The study's kit ids in its order, as a JSON array, read in the same statement as the study. */
const kitIdsJson = sql<string>`(select json_group_array(kit_id) from (select ${schema.studyKit.kitId} as kit_id from ${schema.studyKit} where ${schema.studyKit.studyId} = ${s.id} order by ${schema.studyKit.position}))`;

function listStatement(db: Db, query: ListQuery) {
  const where = and(
    eq(s.organizationId, sql.placeholder("shopId")),
    archivedFilter(s.archivedAt, query.archived),
    query.q?.trim() ? sql`instr(lower(${s.name}), lower(${sql.placeholder("q")})) > 0` : undefined,
  );
  const dir = query.dir ?? (query.sort ? "asc" : "desc");
  const column = sortColumn(query.sort);
  return db
    .select({ ...selection, kitIds: kitIdsJson, total: sql<number>`count(*) over ()` })
    .from(s)
    .innerJoin(schema.user, eq(schema.user.id, s.createdBy))
    .innerJoin(schema.caseProfile, eq(schema.caseProfile.id, s.caseId))
    .where(where)
    .orderBy(dir === "asc" ? asc(column) : desc(column), asc(s.id))
    .limit(sql.placeholder("limit"))
    .offset(sql.placeholder("offset"))
    .prepare();
}

// The list's statement is built once for each shape of query (sort, direction, archived, with a name or not).
const listStatements = new Map<string, ReturnType<typeof listStatement>>();

/** One page of the shop's studies: the rows, their kits and the total in one statement. */
export async function listStudies(caller: Caller, query: ListQuery): Promise<Page<StudyRow>> {
  assertStaff(caller);
  const db = await getDb();
  const q = query.q?.trim() ?? "";
  const shape = `${query.sort ?? ""}|${query.dir ?? ""}|${query.archived ?? ""}|${q ? "q" : ""}`;
  let statement = listStatements.get(shape);
  if (!statement) listStatements.set(shape, (statement = listStatement(db, query)));
  const rows = await statement.execute({ shopId: caller.shopId, q, limit: query.pageSize, offset: (query.page - 1) * query.pageSize });
  // A page past the end has no row to carry the total.
  const where = and(eq(s.organizationId, caller.shopId), archivedFilter(s.archivedAt, query.archived), nameFilter(s.name, query.q));
  const total = rows[0]?.total ?? (query.page > 1 ? ((await db.select({ n: count() }).from(s).where(where))[0]?.n ?? 0) : 0);
  return {
    items: rows.map((r) => toStudyRow({ record: r.record, creatorName: r.creatorName, caseName: r.caseName, kitIds: JSON.parse(r.kitIds) as string[] })),
    page: query.page,
    pageSize: query.pageSize,
    total,
  };
}

// ── Assembling the core's Study ─────────────────────────────────────────────────────────────────

/** The library rows a study is built from: its case, its kits in the study's order, its rig. */
export type StudyLibraryRows = { case: CaseRow | null; kits: KitRow[]; rig: RigRow | null };

async function libraryRowsOf(shopId: string, row: StudyRow): Promise<StudyLibraryRows> {
  const [cases, kits, rigs] = await Promise.all([
    libraryRowsById("cases", shopId, [row.caseId]),
    libraryRowsById("kits", shopId, row.kitIds),
    libraryRowsById("rigs", shopId, row.rigId ? [row.rigId] : []),
  ]);
  return {
    case: cases.get(row.caseId) ?? null,
    kits: row.kitIds.map((id) => kits.get(id)).filter((k) => k !== undefined),
    rig: row.rigId ? (rigs.get(row.rigId) ?? null) : null,
  };
}

/** The study as the core reads it, before validation, from the shop's rows and limits. */
async function assemble(shopId: string, row: StudyRow, rows?: StudyLibraryRows): Promise<AssembledStudy> {
  const [library, ownLimits] = await Promise.all([rows ?? libraryRowsOf(shopId, row), shopLimits(shopId)]);
  return assembleStudy({ ...row, ...library }, ownLimits);
}

/** The assembled study checked by the core's schema, or 422 naming what keeps it from being evaluated. */
function validated(assembled: AssembledStudy): Study {
  const r = checkStudy(assembled);
  if (r.ok) return r.study;
  const message = assembled.kits.length === 0 ? "Add at least one kit to the study to evaluate it." : "The study cannot be evaluated as it stands: fix the fields named.";
  throw new DataError("study_incomplete", message, fieldsOf(r.error));
}

/** A study's row and its assembled Study (what the core evaluates; unchecked when it is incomplete). */
export async function getStudy(caller: Caller, id: string): Promise<{ item: StudyRow; study: Study | AssembledStudy }> {
  const { item, study } = await getStudyWithRows(caller, id);
  return { item, study };
}

/** A study's row, its assembled Study and the library rows it was assembled from (the study page seeds its cache with them). */
export async function getStudyWithRows(caller: Caller, id: string): Promise<{ item: StudyRow; study: Study | AssembledStudy; rows: StudyLibraryRows }> {
  const loaded = await loadStudyOr404(caller, id);
  const item = toStudyRow(loaded);
  const rows = await libraryRowsOf(caller.shopId, item);
  const assembled = await assemble(caller.shopId, item, rows);
  const checked = checkStudy(assembled);
  return { item, study: checked.ok ? checked.study : assembled, rows };
}

/** The study evaluated on the server by the core, with the Study it evaluated. */
export async function studyResults(caller: Caller, id: string): Promise<{ study: Study; result: StudyResult }> {
  const loaded = await loadStudyOr404(caller, id);
  return evaluateLoaded(caller.shopId, loaded);
}

/** The same evaluation for a shop known to be the caller's, as objects. */
export async function evaluateStoredStudy(shopId: string, id: string): Promise<{ study: Study; result: StudyResult } | null> {
  const loaded = await loadStudy(shopId, id);
  return loaded ? evaluateLoaded(shopId, loaded) : null;
}

// The results are a pure function of the versioned rows they come from, so each study's last answer is
// kept with the versions it was computed from and served again while none of them has changed.
const RESULTS_KEPT = 500;
const resultsCache = new Map<string, { fingerprint: string; body: string }>();

/**
 * The versions a study's results depend on, as one text made by one statement whose text never changes:
 * the study's, its case's, its rig's, the shop settings' and each kit's id and version in the study's order.
 * No row is read but by its key; null when the study is not the shop's.
 */
const FINGERPRINT_SQL = `select s.version || '|' || c.version || '|' || ifnull(r.version, 0) || '|' || ifnull(ss.version, 0) || '|' ||
    ifnull((select group_concat(sk.kit_id || ':' || k.version, ',' order by sk.position)
      from study_kit sk join cylinder_kit k on k.id = sk.kit_id where sk.study_id = s.id), '') as fingerprint
  from study s join case_profile c on c.id = s.case_id left join boring_rig r on r.id = s.rig_id
    left join shop_settings ss on ss.organization_id = s.organization_id
  where s.id = ? and s.organization_id = ?`;

async function resultsFingerprint(shopId: string, id: string): Promise<string | null> {
  const client = await getClient();
  const r = await client.execute({ sql: FINGERPRINT_SQL, args: [id, shopId] });
  const fingerprint = r.rows[0]?.fingerprint;
  return typeof fingerprint === "string" ? fingerprint : null;
}

/** The results as the JSON text the API answers, computed once per set of row versions. */
export async function studyResultsBody(shopId: string, id: string): Promise<string | null> {
  const fingerprint = await resultsFingerprint(shopId, id);
  if (fingerprint === null) return null;
  const kept = resultsCache.get(id);
  if (kept && kept.fingerprint === fingerprint) return kept.body;
  const loaded = await loadStudy(shopId, id);
  if (!loaded) return null;
  const body = JSON.stringify(await evaluateLoaded(shopId, loaded));
  resultsCache.delete(id);
  resultsCache.set(id, { fingerprint, body });
  if (resultsCache.size > RESULTS_KEPT) resultsCache.delete(resultsCache.keys().next().value as string);
  return body;
}

/** The study's results as JSON text, for the caller's shop only (404 otherwise). */
export async function studyResultsJson(caller: Caller, id: string): Promise<string> {
  assertStaff(caller);
  const body = await studyResultsBody(caller.shopId, id);
  if (body === null) throw notFound("study");
  return body;
}

async function evaluateLoaded(shopId: string, loaded: Loaded): Promise<{ study: Study; result: StudyResult }> {
  const study = validated(await assemble(shopId, toStudyRow(loaded)));
  try {
    return { study, result: evaluateStudy(study) };
  } catch (error) {
    if (error instanceof GeometryError) throw new DataError("geometry", error.message);
    throw error;
  }
}

/** The study as a file: the same JSON the fit CLI reads. */
export async function exportStudy(caller: Caller, id: string): Promise<{ name: string; study: Study }> {
  const loaded = await loadStudyOr404(caller, id);
  return { name: loaded.record.name, study: validated(await assemble(caller.shopId, toStudyRow(loaded))) };
}

/** Who changed what in a study, newest first. */
export async function studyHistory(caller: Caller, id: string): Promise<{ items: HistoryItem[] }> {
  await loadStudyOr404(caller, id);
  const db = await getDb();
  const rows = await db
    .select()
    .from(schema.studyEvent)
    .where(eq(schema.studyEvent.studyId, id))
    .orderBy(desc(schema.studyEvent.at), desc(sql`rowid`))
    .limit(500);
  return { items: rows.map((e) => ({ at: iso(e.at) ?? "", by: { id: e.byId, name: e.byName }, summary: e.summary })) };
}
