import "server-only";
import type { SQLiteColumn } from "drizzle-orm/sqlite-core";
import { and, asc, count, desc, eq, inArray, sql, type SQL } from "drizzle-orm";
import {
  GeometryError,
  StudySchema,
  evaluateStudy,
  type BoringRig,
  type CutPlan,
  type CylinderKit,
  type Readings,
  type Study,
  type StudyLimits,
  type StudyResult,
} from "@/geometry";
import { without, type HistoryItem, type KitData, type ListQuery, type Page, type RigData, type StudyCreate, type StudyPatch, type StudyRow } from "@/model/schemas";
import type { Caller } from "./access";
import { getClient, getDb } from "./client";
import { DataError, conflict } from "./errors";
import { archivedFilter, assembleCase, insertLibraryStmt, nameFilter, newLibraryValues, recordsById } from "./library";
import { assertStaff, fieldsOf, iso, newId, notFound, runBatch, type Stmt } from "./rows";
import * as schema from "./schema";
import { shopLimits } from "./settings";
import { describeChanges, type StudySnapshot } from "./study-history";

// Studies: one case profile, its candidate kits, a rig, the cut plan, the holder readings and the
// study's own limits. The data layer assembles them into the core's Study, the one shape that the
// API, the browser and the fit CLI all evaluate.

const s = schema.study;

type Loaded = { record: schema.StudyRow; creatorName: string; caseName: string; kitIds: string[] };

function toRow(l: Loaded): StudyRow {
  const r = l.record;
  return {
    id: r.id,
    name: r.name,
    version: r.version,
    createdAt: iso(r.createdAt) ?? "",
    updatedAt: iso(r.updatedAt) ?? "",
    createdBy: { id: r.createdBy, name: l.creatorName },
    archivedAt: iso(r.archivedAt),
    notes: r.notes,
    caseId: r.caseId,
    caseName: l.caseName,
    kitIds: l.kitIds,
    rigId: r.rigId,
    cut: r.cutJson ? (JSON.parse(r.cutJson) as CutPlan) : null,
    readings: r.readingsJson ? (JSON.parse(r.readingsJson) as Readings) : null,
    limits: r.limitsJson ? (JSON.parse(r.limitsJson) as StudyLimits) : null,
    chosenKitId: r.chosenKitId,
  };
}

function snapshot(row: StudyRow): StudySnapshot {
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

async function load(shopId: string, id: string): Promise<Loaded | null> {
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

async function loadOr404(caller: Caller, id: string): Promise<Loaded> {
  assertStaff(caller);
  const found = await load(caller.shopId, id);
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

/** One page of the shop's studies. */
export async function listStudies(caller: Caller, query: ListQuery): Promise<Page<StudyRow>> {
  assertStaff(caller);
  const db = await getDb();
  const where = and(eq(s.organizationId, caller.shopId), archivedFilter(s.archivedAt, query.archived), nameFilter(s.name, query.q));
  const dir = query.dir ?? (query.sort ? "asc" : "desc");
  const column = sortColumn(query.sort);
  const [totalRow] = await db.select({ n: count() }).from(s).where(where);
  const rows = await db
    .select(selection)
    .from(s)
    .innerJoin(schema.user, eq(schema.user.id, s.createdBy))
    .innerJoin(schema.caseProfile, eq(schema.caseProfile.id, s.caseId))
    .where(where)
    .orderBy(dir === "asc" ? asc(column) : desc(column), asc(s.id))
    .limit(query.pageSize)
    .offset((query.page - 1) * query.pageSize);
  const kits = await kitIdsOf(rows.map((r) => r.record.id));
  return {
    items: rows.map((r) => toRow({ ...r, kitIds: kits.get(r.record.id) ?? [] })),
    page: query.page,
    pageSize: query.pageSize,
    total: totalRow?.n ?? 0,
  };
}

// ── Assembling the core's Study ─────────────────────────────────────────────────────────────────

/** The study as the core reads it, before validation: case, kits (id and name from their rows), rig, cut, readings, limits. */
async function assemble(shopId: string, row: StudyRow): Promise<Record<string, unknown>> {
  const [cases, kits, rigs, ownLimits] = await Promise.all([
    recordsById("cases", shopId, [row.caseId]),
    recordsById("kits", shopId, row.kitIds),
    recordsById("rigs", shopId, row.rigId ? [row.rigId] : []),
    shopLimits(shopId),
  ]);
  const caseRecord = cases.get(row.caseId) as schema.CaseProfileRow | undefined;
  const study: Record<string, unknown> = { name: row.name };
  if (caseRecord) study.case = assembleCase(caseRecord);
  study.kits = row.kitIds
    .map((id) => kits.get(id))
    .filter((k) => k !== undefined)
    .map((k): CylinderKit => ({ id: k.id, name: k.name, ...(JSON.parse(k.dataJson) as KitData) }));
  const rig = row.rigId ? rigs.get(row.rigId) : undefined;
  if (rig) study.rig = { ...(JSON.parse(rig.dataJson) as RigData), name: rig.name } satisfies BoringRig;
  if (row.cut) study.cut = row.cut;
  if (row.readings) study.readings = row.readings;
  const limits = { ...ownLimits, ...(row.limits ?? {}) };
  if (Object.keys(limits).length > 0) study.limits = limits;
  return study;
}

/** The assembled study checked by the core's schema, or 422 naming what keeps it from being evaluated. */
function validated(assembled: Record<string, unknown>): Study {
  const r = StudySchema.safeParse(assembled);
  if (r.success) return r.data;
  const fields = fieldsOf(r.error);
  const message =
    Array.isArray(assembled.kits) && assembled.kits.length === 0
      ? "Add at least one kit to the study to evaluate it."
      : "The study cannot be evaluated as it stands: fix the fields named.";
  throw new DataError("study_incomplete", message, fields);
}

/** A study's row and its assembled Study (what the core evaluates; unchecked when it is incomplete). */
export async function getStudy(caller: Caller, id: string): Promise<{ item: StudyRow; study: unknown }> {
  const loaded = await loadOr404(caller, id);
  const item = toRow(loaded);
  const assembled = await assemble(caller.shopId, item);
  const parsed = StudySchema.safeParse(assembled);
  return { item, study: parsed.success ? parsed.data : assembled };
}

/** The study evaluated on the server by the core, with the Study it evaluated. */
export async function studyResults(caller: Caller, id: string): Promise<{ study: Study; result: StudyResult }> {
  const loaded = await loadOr404(caller, id);
  return evaluateLoaded(caller.shopId, loaded);
}

/** The same evaluation for a shop known to be the caller's, as objects. */
export async function evaluateStoredStudy(shopId: string, id: string): Promise<{ study: Study; result: StudyResult } | null> {
  const loaded = await load(shopId, id);
  return loaded ? evaluateLoaded(shopId, loaded) : null;
}

// The results are a pure function of the versioned rows they come from, so each study's last answer is
// kept with the versions it was computed from and served again while none of them has changed.
const RESULTS_KEPT = 500;
const resultsCache = new Map<string, { fingerprint: string; body: string }>();

/** The versions a study's results depend on, in one query; null when the study is not the shop's. */
async function resultsFingerprint(shopId: string, id: string): Promise<string | null> {
  const client = await getClient();
  const r = await client.execute({
    sql: `select s.version as sv, c.version as cv, ifnull(r.version, 0) as rv, ifnull(ss.version, 0) as setv,
            (select group_concat(k.id || ':' || k.version, ',') from (select k.id, k.version from study_kit sk join cylinder_kit k on k.id = sk.kit_id
              where sk.study_id = s.id order by sk.position) k) as kv
          from study s join case_profile c on c.id = s.case_id left join boring_rig r on r.id = s.rig_id
            left join shop_settings ss on ss.organization_id = s.organization_id
          where s.id = ? and s.organization_id = ?`,
    args: [id, shopId],
  });
  const row = r.rows[0];
  return row ? `${row.sv}|${row.cv}|${row.rv}|${row.setv}|${row.kv ?? ""}` : null;
}

/** The results as the JSON text the API answers, computed once per set of row versions. */
export async function studyResultsBody(shopId: string, id: string): Promise<string | null> {
  const fingerprint = await resultsFingerprint(shopId, id);
  if (fingerprint === null) return null;
  const kept = resultsCache.get(id);
  if (kept && kept.fingerprint === fingerprint) return kept.body;
  const loaded = await load(shopId, id);
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
  const study = validated(await assemble(shopId, toRow(loaded)));
  try {
    return { study, result: evaluateStudy(study) };
  } catch (error) {
    if (error instanceof GeometryError) throw new DataError("geometry", error.message);
    throw error;
  }
}

/** The study as a file: the same JSON the fit CLI reads. */
export async function exportStudy(caller: Caller, id: string): Promise<{ name: string; study: Study }> {
  const loaded = await loadOr404(caller, id);
  return { name: loaded.record.name, study: validated(await assemble(caller.shopId, toRow(loaded))) };
}

// ── Checking references ─────────────────────────────────────────────────────────────────────────

type Refs = { caseId: string; kitIds: readonly string[]; rigId: string | null; readings: Readings | null; chosenKitId: string | null };

/** Every id names a row of the caller's shop, the holder readings name the case's studs, the choice is one of the kits. */
async function checkRefs(caller: Caller, refs: Refs): Promise<Map<string, string>> {
  const [cases, kits, rigs] = await Promise.all([
    recordsById("cases", caller.shopId, [refs.caseId]),
    recordsById("kits", caller.shopId, refs.kitIds),
    recordsById("rigs", caller.shopId, refs.rigId ? [refs.rigId] : []),
  ]);
  const fields: Record<string, string> = {};
  const caseRecord = cases.get(refs.caseId) as schema.CaseProfileRow | undefined;
  if (!caseRecord) fields.caseId = "No case profile with this id in your shop.";
  refs.kitIds.forEach((id, i) => {
    if (!kits.has(id)) fields[`kitIds.${i}`] = "No cylinder kit with this id in your shop.";
  });
  if (refs.rigId && !rigs.has(refs.rigId)) fields.rigId = "No boring rig with this id in your shop.";
  if (refs.chosenKitId && !refs.kitIds.includes(refs.chosenKitId)) fields.chosenKitId = "The chosen kit must be one of the study's kits.";
  if (caseRecord && refs.readings) {
    const studs = new Set(assembleCase(caseRecord).studs.map((st) => st.label));
    const used = new Set<string>();
    refs.readings.holderHeights.forEach((h, i) => {
      if (!studs.has(h.stud)) fields[`readings.holderHeights.${i}.stud`] = `The case profile has no stud labelled "${h.stud}".`;
      else if (used.has(h.stud)) fields[`readings.holderHeights.${i}.stud`] = `A second reading at stud "${h.stud}".`;
      used.add(h.stud);
    });
  }
  if (Object.keys(fields).length > 0) throw new DataError("invalid_input", "Some fields are not valid.", fields);
  const names = new Map<string, string>();
  if (caseRecord) names.set(caseRecord.id, caseRecord.name);
  for (const k of kits.values()) names.set(k.id, k.name);
  for (const r of rigs.values()) names.set(r.id, r.name);
  return names;
}

// ── Writing ─────────────────────────────────────────────────────────────────────────────────────


function eventStmt(studyId: string, caller: Caller, at: number, summary: string, guardWriteId?: string): Stmt {
  const values = [newId(), studyId, at, caller.userId, caller.name, summary];
  if (!guardWriteId) return { sql: "insert into study_event (id, study_id, at, by_id, by_name, summary) values (?, ?, ?, ?, ?, ?)", args: values };
  return {
    sql: "insert into study_event (id, study_id, at, by_id, by_name, summary) select ?, ?, ?, ?, ?, ? where exists (select 1 from study where id = ? and write_id = ?)",
    args: [...values, studyId, guardWriteId],
  };
}

const json = (v: unknown) => (v === null || v === undefined ? null : JSON.stringify(v));

/** Statements that insert a whole new study with its kits and its first history line. */
function insertStudyStmts(caller: Caller, id: string, at: number, v: Omit<StudySnapshot, "kitIds"> & { kitIds: readonly string[] }, summary: string): Stmt[] {
  return [
    {
      sql: `insert into study (id, organization_id, name, notes, case_id, rig_id, cut_json, readings_json, limits_json, chosen_kit_id, write_id, version, created_at, updated_at, created_by)
            values (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, 1, ?, ?, ?)`,
      args: [id, caller.shopId, v.name, v.notes, v.caseId, v.rigId, json(v.cut), json(v.readings), json(v.limits), v.chosenKitId, newId(), at, at, caller.userId],
    },
    ...v.kitIds.map((kitId, position) => ({ sql: "insert into study_kit (study_id, kit_id, position) values (?, ?, ?)", args: [id, kitId, position] })),
    eventStmt(id, caller, at, summary),
  ];
}

/** Creates a study from the shop's own library rows. */
export async function createStudy(caller: Caller, body: StudyCreate): Promise<StudyRow> {
  assertStaff(caller);
  const refs = { caseId: body.caseId, kitIds: body.kitIds, rigId: body.rigId ?? null, readings: body.readings ?? null, chosenKitId: null };
  await checkRefs(caller, refs);
  const id = newId();
  const now = Date.now();
  await runBatch(
    insertStudyStmts(
      caller,
      id,
      now,
      { ...refs, name: body.name, notes: body.notes ?? "", cut: body.cut ?? null, limits: body.limits ?? null },
      "created the study",
    ),
  );
  return toRow((await load(caller.shopId, id)) as Loaded);
}

/** Changes a study when the caller names its current version; the kits, the row and its history change together or not at all. */
export async function updateStudy(caller: Caller, id: string, patch: StudyPatch): Promise<StudyRow> {
  const loaded = await loadOr404(caller, id);
  const before = toRow(loaded);
  if (before.version !== patch.version) throw conflict();

  const kitIds = patch.kitIds ?? before.kitIds;
  let chosenKitId = patch.chosenKitId !== undefined ? patch.chosenKitId : before.chosenKitId;
  // A kit taken out of the study stops being its choice.
  if (patch.chosenKitId === undefined && chosenKitId && !kitIds.includes(chosenKitId)) chosenKitId = null;
  const after: StudySnapshot = {
    name: patch.name ?? before.name,
    notes: patch.notes ?? before.notes,
    caseId: patch.caseId ?? before.caseId,
    kitIds,
    rigId: patch.rigId !== undefined ? patch.rigId : before.rigId,
    cut: patch.cut !== undefined ? patch.cut : before.cut,
    readings: patch.readings !== undefined ? patch.readings : before.readings,
    limits: patch.limits !== undefined ? patch.limits : before.limits,
    chosenKitId,
  };
  const names = await checkRefs(caller, after);
  const oldNames = await checkNamesOf(caller, before);
  const nameOf = (kitOrOther: string) => names.get(kitOrOther) ?? oldNames.get(kitOrOther) ?? "(deleted)";
  const changes = describeChanges(snapshot(before), after, nameOf);
  if (changes.length === 0) return before;

  const now = Date.now();
  const writeId = newId();
  const guard = "exists (select 1 from study where id = ? and write_id = ?)";
  const stmts: Stmt[] = [
    {
      sql: `update study set name = ?, notes = ?, case_id = ?, rig_id = ?, cut_json = ?, readings_json = ?, limits_json = ?, chosen_kit_id = ?,
            write_id = ?, version = version + 1, updated_at = ? where id = ? and organization_id = ? and version = ?`,
      args: [after.name, after.notes, after.caseId, after.rigId, json(after.cut), json(after.readings), json(after.limits), after.chosenKitId, writeId, now, id, caller.shopId, patch.version],
    },
  ];
  if (JSON.stringify(before.kitIds) !== JSON.stringify(after.kitIds)) {
    stmts.push({ sql: `delete from study_kit where study_id = ? and ${guard}`, args: [id, id, writeId] });
    after.kitIds.forEach((kitId, position) =>
      stmts.push({ sql: `insert into study_kit (study_id, kit_id, position) select ?, ?, ? where ${guard}`, args: [id, kitId, position, id, writeId] }),
    );
  }
  for (const summary of changes) stmts.push(eventStmt(id, caller, now, summary, writeId));
  const results = await runBatch(stmts);
  // Someone else's update landed between our read and our write: nothing of ours was written.
  if (results[0]?.rowsAffected === 0) throw conflict();
  return toRow((await load(caller.shopId, id)) as Loaded);
}

/** Names of the rows a study referred to before a change (kits since taken out still have their names). */
async function checkNamesOf(caller: Caller, row: StudyRow): Promise<Map<string, string>> {
  const [cases, kits, rigs] = await Promise.all([
    recordsById("cases", caller.shopId, [row.caseId]),
    recordsById("kits", caller.shopId, row.kitIds),
    recordsById("rigs", caller.shopId, row.rigId ? [row.rigId] : []),
  ]);
  const names = new Map<string, string>();
  for (const m of [cases, kits, rigs]) for (const r of m.values()) names.set(r.id, r.name);
  return names;
}

/** Archives or restores a study; studies are never deleted. */
export async function setStudyArchived(caller: Caller, id: string, archived: boolean): Promise<StudyRow> {
  const loaded = await loadOr404(caller, id);
  if ((loaded.record.archivedAt !== null) === archived) return toRow(loaded);
  const now = Date.now();
  const writeId = newId();
  await runBatch([
    {
      sql: "update study set archived_at = ?, write_id = ?, version = version + 1, updated_at = ? where id = ? and organization_id = ?",
      args: [archived ? now : null, writeId, now, id, caller.shopId],
    },
    eventStmt(id, caller, now, archived ? "archived the study" : "restored the study", writeId),
  ]);
  return toRow((await load(caller.shopId, id)) as Loaded);
}

/** A copy of a study (same case, kits, rig, cut, readings and limits) under a new name. */
export async function duplicateStudy(caller: Caller, id: string): Promise<StudyRow> {
  const loaded = await loadOr404(caller, id);
  const row = toRow(loaded);
  const suffix = " (copy)";
  const name = row.name.slice(0, 80 - suffix.length) + suffix;
  const copyId = newId();
  await runBatch(insertStudyStmts(caller, copyId, Date.now(), { ...snapshot(row), name }, `duplicated from "${row.name}"`));
  return toRow((await load(caller.shopId, copyId)) as Loaded);
}

/** Who changed what in a study, newest first. */
export async function studyHistory(caller: Caller, id: string): Promise<{ items: HistoryItem[] }> {
  await loadOr404(caller, id);
  const db = await getDb();
  const rows = await db
    .select()
    .from(schema.studyEvent)
    .where(eq(schema.studyEvent.studyId, id))
    .orderBy(desc(schema.studyEvent.at), desc(sql`rowid`))
    .limit(500);
  return { items: rows.map((e) => ({ at: iso(e.at) ?? "", by: { id: e.byId, name: e.byName }, summary: e.summary })) };
}

/** The most kits one imported study may bring (the same bound as a study's kit list). */
export const MAX_STUDY_KITS = 50;

/** Creates a study from a study file: its case, kits and rig become new rows of the shop's library. All or nothing. */
export async function importStudy(caller: Caller, study: Study): Promise<StudyRow> {
  assertStaff(caller);
  if (study.kits.length > MAX_STUDY_KITS) {
    throw new DataError("invalid_input", "Some fields are not valid.", { kits: `A study compares at most ${MAX_STUDY_KITS} kits.` });
  }
  const now = Date.now();
  const { name: caseName, ...caseData } = study.case;
  const caseValues = newLibraryValues(caller, "cases", { name: caseName, data: caseData }, now);
  const kitValues = study.kits.map((k) => newLibraryValues(caller, "kits", { name: k.name, data: without(without(k, "id"), "name") }, now));
  const rigValues = study.rig ? (({ name, ...data }) => newLibraryValues(caller, "rigs", { name, data }, now))(study.rig) : null;

  const studyId = newId();
  const stmts: Stmt[] = [
    insertLibraryStmt("cases", caseValues),
    ...kitValues.map((k) => insertLibraryStmt("kits", k)),
    ...(rigValues ? [insertLibraryStmt("rigs", rigValues)] : []),
    ...insertStudyStmts(
      caller,
      studyId,
      now,
      {
        name: study.name ?? caseName,
        notes: "",
        caseId: caseValues.id,
        kitIds: kitValues.map((k) => k.id),
        rigId: rigValues?.id ?? null,
        cut: study.cut ?? null,
        readings: study.readings ?? null,
        limits: study.limits ?? null,
        chosenKitId: null,
      },
      "imported from a study file",
    ),
  ];
  await runBatch(stmts);
  return toRow((await load(caller.shopId, studyId)) as Loaded);
}
