import { getJson, queryString, sendJson } from "../fetch";
import type { CsvReport, LibraryKind, ListParams, Page, RowOf } from "../types";

export function fetchLibraryList<K extends LibraryKind>(kind: K, params: ListParams): Promise<Page<RowOf<K>>> {
  return getJson(`/api/v1/${kind}${queryString({ ...params })}`);
}

export async function fetchLibraryRow<K extends LibraryKind>(kind: K, id: string): Promise<RowOf<K>> {
  const { item } = await getJson<{ item: RowOf<K> }>(`/api/v1/${kind}/${encodeURIComponent(id)}`);
  return item;
}

export async function createLibraryRow<K extends LibraryKind>(kind: K, body: unknown): Promise<RowOf<K>> {
  const { item } = await sendJson<{ item: RowOf<K> }>("POST", `/api/v1/${kind}`, body);
  return item;
}

export async function updateLibraryRow<K extends LibraryKind>(kind: K, id: string, body: unknown): Promise<RowOf<K>> {
  const { item } = await sendJson<{ item: RowOf<K> }>("PATCH", `/api/v1/${kind}/${encodeURIComponent(id)}`, body);
  return item;
}

export async function setLibraryArchived<K extends LibraryKind>(kind: K, id: string, archived: boolean): Promise<RowOf<K>> {
  const { item } = await sendJson<{ item: RowOf<K> }>("POST", `/api/v1/${kind}/${encodeURIComponent(id)}/${archived ? "archive" : "restore"}`);
  return item;
}

export async function deleteLibraryRow(kind: LibraryKind, id: string): Promise<void> {
  await sendJson<null>("DELETE", `/api/v1/${kind}/${encodeURIComponent(id)}`);
}

export function importLibraryCsv(kind: "cases" | "kits", csv: string, confirm: boolean): Promise<CsvReport> {
  return sendJson("POST", `/api/v1/library/import${queryString({ kind })}`, { csv, confirm });
}
