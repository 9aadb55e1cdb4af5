import type { StudyInput } from "@/geometry";
import { getJson, queryString, sendJson } from "../fetch";
import type { HistoryEntry, ListParams, Page, StudyDetail, StudyRow } from "../types";

const base = "/api/v1/studies";
const one = (id: string) => `${base}/${encodeURIComponent(id)}`;

export const fetchStudies = (params: ListParams) => getJson<Page<StudyRow>>(`${base}${queryString({ ...params })}`);
export const fetchStudy = (id: string) => getJson<StudyDetail>(one(id));
export const fetchStudyHistory = (id: string) => getJson<{ items: HistoryEntry[] }>(`${one(id)}/history`);

export type StudyCreate = { name: string; caseId: string; kitIds: string[]; rigId?: string | null; notes?: string };
export type StudyPatch = Partial<Omit<StudyRow, "id" | "version" | "createdAt" | "updatedAt" | "createdBy" | "archivedAt">> & { version: number };

export const createStudy = async (body: StudyCreate) => (await sendJson<{ item: StudyRow }>("POST", base, body)).item;
export const patchStudy = async (id: string, body: StudyPatch) => (await sendJson<{ item: StudyRow }>("PATCH", one(id), body)).item;
export const duplicateStudy = async (id: string) => (await sendJson<{ item: StudyRow }>("POST", `${one(id)}/duplicate`)).item;
export const setStudyArchived = async (id: string, archived: boolean) =>
  (await sendJson<{ item: StudyRow }>("POST", `${one(id)}/${archived ? "archive" : "restore"}`)).item;
export const importStudy = async (study: unknown) => (await sendJson<{ item: StudyRow }>("POST", `${base}/import`, study)).item;
export const exportStudyUrl = (id: string) => `${one(id)}/export`;
export type { StudyInput };
