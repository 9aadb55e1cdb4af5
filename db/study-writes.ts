import "server-only";
import type { Readings, Study } from "@/geometry";
import { without, type StudyCreate, type StudyPatch, type StudyRow } from "@/model/schemas";
import type { Caller } from "./access";
import { DataError, conflict } from "./errors";
import { libraryRowsById, recordsById } from "./library";
import { insertLibraryStmt, newLibraryValues } from "./library-writes";
import { assertStaff, newId, runBatch, type Stmt } from "./rows";
import { describeChanges, type StudySnapshot } from "@/model/study-history";
import { loadStudy, loadStudyOr404, snapshotOf, toStudyRow, type Loaded } from "./studies";

// Writing studies: creating one from the shop's rows or from a study file, changing it under the version
// the caller read (the kits, the row and its history together or not at all), archiving and duplicating.

// ── Checking references ─────────────────────────────────────────────────────────────────────────

type Refs = { caseId: string; kitIds: readonly string[]; rigId: string | null; readings: Readings | null; chosenKitId: string | null };

/** Every id names a row of the caller's shop, the holder readings name the case's studs, the choice is one of the kits. */
async function checkRefs(caller: Caller, refs: Refs): Promise<Map<string, string>> {
  const [cases, kits, rigs] = await Promise.all([
    libraryRowsById("cases", caller.shopId, [refs.caseId]),
    libraryRowsById("kits", caller.shopId, refs.kitIds),
    libraryRowsById("rigs", caller.shopId, refs.rigId ? [refs.rigId] : []),
  ]);
  const fields: Record<string, string> = {};
  const caseRecord = cases.get(refs.caseId);
  if (!caseRecord) fields.caseId = "No case profile with this id in your shop.";
  refs.kitIds.forEach((id, i) => {
    if (!kits.has(id)) fields[`kitIds.${i}`] = "No cylinder kit with this id in your shop.";
  });
  if (refs.rigId && !rigs.has(refs.rigId)) fields.rigId = "No boring rig with this id in your shop.";
  if (refs.chosenKitId && !refs.kitIds.includes(refs.chosenKitId)) fields.chosenKitId = "The chosen kit must be one of the study's kits.";
  if (caseRecord && refs.readings) {
    const studs = new Set(caseRecord.data.studs.map((st) => st.label));
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
  return toStudyRow((await loadStudy(caller.shopId, id)) as Loaded);
}

/** Changes a study when the caller names its current version; the kits, the row and its history change together or not at all. */
export async function updateStudy(caller: Caller, id: string, patch: StudyPatch): Promise<StudyRow> {
  const loaded = await loadStudyOr404(caller, id);
  const before = toStudyRow(loaded);
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
  const changes = describeChanges(snapshotOf(before), after, nameOf);
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
  return toStudyRow((await loadStudy(caller.shopId, id)) as Loaded);
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
  const loaded = await loadStudyOr404(caller, id);
  if ((loaded.record.archivedAt !== null) === archived) return toStudyRow(loaded);
  const now = Date.now();
  const writeId = newId();
  await runBatch([
    {
      sql: "update study set archived_at = ?, write_id = ?, version = version + 1, updated_at = ? where id = ? and organization_id = ?",
      args: [archived ? now : null, writeId, now, id, caller.shopId],
    },
    eventStmt(id, caller, now, archived ? "archived the study" : "restored the study", writeId),
  ]);
  return toStudyRow((await loadStudy(caller.shopId, id)) as Loaded);
}

/** A copy of a study (same case, kits, rig, cut, readings and limits) under a new name. */
export async function duplicateStudy(caller: Caller, id: string): Promise<StudyRow> {
  const loaded = await loadStudyOr404(caller, id);
  const row = toStudyRow(loaded);
  const suffix = " (copy)";
  const name = row.name.slice(0, 80 - suffix.length) + suffix;
  const copyId = newId();
  await runBatch(insertStudyStmts(caller, copyId, Date.now(), { ...snapshotOf(row), name }, `duplicated from "${row.name}"`));
  return toStudyRow((await loadStudy(caller.shopId, copyId)) as Loaded);
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
  // A study file's kit price is a bare number: read as euros, as the library's prices were before they carried a currency.
  const kitValues = study.kits.map((k) => {
    const { price, ...rest } = without(without(k, "id"), "name");
    const data = price === undefined ? rest : { ...rest, price: { amountMinor: Math.round(price * 100), currency: "EUR" as const } };
    return newLibraryValues(caller, "kits", { name: k.name, data }, now);
  });
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
  return toStudyRow((await loadStudy(caller.shopId, studyId)) as Loaded);
}
