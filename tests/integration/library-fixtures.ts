// Invented library rows for the library and studies tests, and small helpers over the test HTTP client.
import { expect } from "vitest";
import { SHORT_SHAFT_RIG } from "@/db/seed-library";
import { Http, signUp, testDb, uniqueEmail, type Reply } from "../support/http";

export type ErrorBody = { error: { code: string; message: string; fields?: Record<string, string> } };

export function expectError(res: Reply, status: number, code?: string): ErrorBody {
  expect(res.status, res.text.slice(0, 400)).toBe(status);
  expect(res.json).toMatchObject({ error: { code: expect.any(String), message: expect.any(String) } });
  const body = res.json as ErrorBody;
  if (code) expect(body.error.code).toBe(code);
  return body;
}

export function ok<T = Record<string, unknown>>(res: Reply, status = 200): T {
  expect(res.status, `${res.status}: ${res.text.slice(0, 600)}`).toBe(status);
  return res.json as T;
}

export const patch = (http: Http, path: string, body: unknown) => http.send("PATCH", path, body);
export const del = (http: Http, path: string) => http.send("DELETE", path);

const studs = [
  { label: "front left", positionMm: [-28, 28] },
  { label: "front right", positionMm: [28, 28] },
  { label: "rear right", positionMm: [28, -28] },
  { label: "rear left", positionMm: [-28, -28] },
];

/** A round-mouth two-stroke case with four studs on a square and two transfer pockets. */
export const caseData = () => ({
  deck: { kind: "polygon", pointsMm: [[-40, -48], [40, -48], [48, -40], [48, 40], [40, 48], [-40, 48], [-48, 40], [-48, -40]] },
  mouth: { outline: { kind: "circle", diameterMm: 46 }, depthMm: 26 },
  studs,
  studHoleDiameterMm: 7.5,
  studThread: "M7",
  pockets: [
    { label: "left transfer", outline: { kind: "polygon", pointsMm: [[-35, -9], [-30.5, -8], [-30, 0], [-30.5, 8], [-35, 9]] } },
    { label: "right transfer", outline: { kind: "polygon", pointsMm: [[35, -9], [35, 9], [30.5, 8], [30, 0], [30.5, -8]] } },
  ],
  stockBoreMm: 40,
  strokeMm: 39.2,
});

export const kitData = (boreMm: number, skirtMm: number, extra: Record<string, unknown> = {}) => ({
  boreMm,
  skirtDiameterReadingsMm: [skirtMm, skirtMm + 0.03],
  skirtLengthReadingsMm: [24.6, 24.7],
  studs,
  studThread: "M7",
  baseGasketsMm: [0.2, 0.4],
  ...extra,
});

/** The demo shop's short-shaft bench rig's data: head, bit and calibration, three grooves, the shims at hand. */
export const rigData = () => structuredClone(SHORT_SHAFT_RIG.data);

export type Row = { id: string; name: string; version: number; [k: string]: unknown };

let n = 0;
const tag = () => `${Date.now().toString(36)}-${n++}`;

export async function newCase(http: Http, name = `Test case ${tag()}`, extra: Record<string, unknown> = {}): Promise<Row> {
  return ok<{ item: Row }>(await http.post("/api/v1/cases", { name, data: caseData(), ...extra }), 201).item;
}
export async function newKit(http: Http, boreMm = 47, skirtMm = 53.92, name = `Test kit ${boreMm} ${tag()}`): Promise<Row> {
  return ok<{ item: Row }>(await http.post("/api/v1/kits", { name, data: kitData(boreMm, skirtMm) }), 201).item;
}
export async function newRig(http: Http, name = `Test rig ${tag()}`): Promise<Row> {
  return ok<{ item: Row }>(await http.post("/api/v1/rigs", { name, data: rigData() }), 201).item;
}
export async function newStudy(http: Http, extra: Record<string, unknown> = {}): Promise<{ study: Row; caseRow: Row; kits: Row[]; rig: Row }> {
  const caseRow = await newCase(http);
  const kits = [await newKit(http, 47, 53.92), await newKit(http, 50, 57.4)];
  const rig = await newRig(http);
  const body = { name: `Test study ${tag()}`, caseId: caseRow.id, kitIds: kits.map((k) => k.id), rigId: rig.id, ...extra };
  const study = ok<{ item: Row }>(await http.post("/api/v1/studies", body), 201).item;
  return { study, caseRow, kits, rig };
}

/** The owner of a brand-new shop of their own. */
export async function freshShopOwner(label = "Shop Owner"): Promise<Http> {
  return signUp(label, uniqueEmail("library"));
}

/** How many rows of each library table, and history lines, the caller's shop has (other tests' shops do not count). */
export async function shopCounts(http: Http): Promise<Record<string, number>> {
  const { me } = ok<{ me: { shopId: string } }>(await http.get("/api/v1/me"));
  const db = testDb();
  try {
    const r = await db.execute({
      sql: `select (select count(*) from case_profile where organization_id = ?1) as cases,
                   (select count(*) from cylinder_kit where organization_id = ?1) as kits,
                   (select count(*) from boring_rig where organization_id = ?1) as rigs,
                   (select count(*) from study where organization_id = ?1) as studies,
                   (select count(*) from study_event where study_id in (select id from study where organization_id = ?1)) as events`,
      args: [me.shopId],
    });
    return Object.fromEntries(Object.entries(r.rows[0] ?? {}).map(([k, v]) => [k, Number(v)]));
  } finally {
    db.close();
  }
}
