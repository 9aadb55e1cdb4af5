// A case profile's deck photo over HTTP against the real server and object store: its reference points
// go in with the upload, are changed and cleared, come back as sent, and bad points are refused in the one
// error shape with nothing changed; deleting the case removes the photos' rows and files, archiving keeps them;
// the optional crank chamber lengths go through the case API into the study's crank check.
import { readdirSync } from "node:fs";
import { join } from "node:path";
import { beforeAll, describe, expect, inject, it } from "vitest";
import { countRows, type Http } from "../support/http";
import { greyPng } from "../support/png";
import { caseData, del, expectError, freshShopOwner, newCase, newKit, ok, patch, type Row } from "./library-fixtures";

const W = 400;
const H = 300;
const PHOTO = greyPng(W, H);

const rectangle = { kind: "rectangle", points: [[60, 240], [340, 250], [330, 40], [70, 50]], widthMm: 56, heightMm: 56 } as const;
const scale = { kind: "scale", points: [[60, 240], [330, 40]], distanceMm: 79.196 } as const;

type PhotoItem = { id: string; state: string; reference: unknown; widthPx: number | null; heightPx: number | null };

async function upload(http: Http, caseId: string, extra: Record<string, unknown> = {}): Promise<string> {
  const start = ok<{ id: string; uploadUrl: string; headers: Record<string, string> }>(
    await http.post(`/api/v1/cases/${caseId}/photos`, { contentType: "image/png", sizeBytes: PHOTO.length, widthPx: W, heightPx: H, ...extra }),
    201,
  );
  const put = await fetch(start.uploadUrl, { method: "PUT", headers: start.headers, body: new Uint8Array(PHOTO) });
  expect(put.status).toBe(200);
  ok(await http.post(`/api/v1/cases/${caseId}/photos/${start.id}/complete`));
  return start.id;
}

async function photos(http: Http, caseId: string): Promise<PhotoItem[]> {
  return ok<{ items: PhotoItem[] }>(await http.get(`/api/v1/cases/${caseId}/photos`)).items;
}

/** The files the object store holds whose path names this photo (s3rver keeps one file per object under its folder). */
function storedFiles(photoId: string): string[] {
  const found: string[] = [];
  const walk = (dir: string) => {
    for (const e of readdirSync(dir, { withFileTypes: true })) {
      const path = join(dir, e.name);
      if (e.isDirectory()) walk(path);
      else if (path.includes(photoId)) found.push(path);
    }
  };
  walk(inject("jobFakes").objectDir);
  return found;
}

let owner: Http;
beforeAll(async () => {
  owner = await freshShopOwner("Photo Owner");
});

describe("a case photo's reference points", () => {
  it("go in with the upload, change, clear, and come back exactly as sent", async () => {
    const c = await newCase(owner);
    const id = await upload(owner, c.id, { reference: rectangle });
    const [first] = await photos(owner, c.id);
    expect(first.id).toBe(id);
    expect(first.reference).toEqual(rectangle);

    const changed = ok<{ item: PhotoItem }>(await patch(owner, `/api/v1/cases/${c.id}/photos/${id}`, { reference: scale }));
    expect(changed.item.reference).toEqual(scale);
    expect((await photos(owner, c.id))[0].reference).toEqual(scale);

    ok(await patch(owner, `/api/v1/cases/${c.id}/photos/${id}`, { reference: null }));
    expect((await photos(owner, c.id))[0].reference).toBeNull();
  });

  it("are refused when they coincide, lie on one line, leave the photo or are no numbers, and nothing changes", async () => {
    const c = await newCase(owner);
    const id = await upload(owner, c.id, { reference: rectangle });
    const url = `/api/v1/cases/${c.id}/photos/${id}`;

    const coincident = expectError(await patch(owner, url, { reference: { ...scale, points: [[100, 100], [100, 100]] } }), 400, "invalid_input");
    expect(coincident.error.fields?.["reference.points"]).toMatch(/same spot/);

    const collinear = expectError(await patch(owner, url, { reference: { ...rectangle, points: [[10, 10], [100, 10], [200, 10], [100, 200]] } }), 400, "invalid_input");
    expect(collinear.error.fields?.["reference.points"]).toMatch(/one line/);

    const outside = expectError(await patch(owner, url, { reference: { ...scale, points: [[60, 240], [W + 20, 40]] } }), 400, "invalid_input");
    expect(outside.error.fields?.["reference.points.1"]).toMatch(/outside the 400 × 300 pixel photo/);

    // 1e400 is read as Infinity by JSON.parse: not a finite number.
    const infinite = expectError(await owner.send("PATCH", url, `{"reference":{"kind":"scale","points":[[1e400,2],[30,40]],"distanceMm":10}}`), 400, "invalid_input");
    expect(Object.keys(infinite.error.fields ?? {})).toContain("reference.points.0.0");

    const noDistance = expectError(await patch(owner, url, { reference: { ...scale, distanceMm: 0 } }), 400, "invalid_input");
    expect(noDistance.error.fields?.["reference.distanceMm"]).toMatch(/above zero/);

    const unknownKind = expectError(await patch(owner, url, { reference: { kind: "triangle", points: [] } }), 400, "invalid_input");
    expect(unknownKind.error.fields).toHaveProperty("reference.kind");

    expect((await photos(owner, c.id))[0].reference).toEqual(rectangle);
  });

  it("are refused with a new upload that lies outside the declared photo or has no size, and no photo is started", async () => {
    const c = await newCase(owner);
    const start = (reference: unknown, size: Record<string, number>) =>
      owner.post(`/api/v1/cases/${c.id}/photos`, { contentType: "image/png", sizeBytes: PHOTO.length, ...size, reference });
    const outside = expectError(await start(rectangle, { widthPx: 200, heightPx: 200 }), 400, "invalid_input");
    expect(Object.keys(outside.error.fields ?? {})).toEqual(expect.arrayContaining(["reference.points.0", "reference.points.1"]));
    const sizeless = expectError(await start(rectangle, {}), 400, "invalid_input");
    expect(sizeless.error.fields?.reference).toMatch(/widthPx and heightPx/);
    expect(await countRows("case_photo", { case_id: c.id })).toBe(0);
  });

  it("of another shop's photo answer 404", async () => {
    const c = await newCase(owner);
    const id = await upload(owner, c.id);
    const stranger = await freshShopOwner("Other Photo Owner");
    expectError(await patch(stranger, `/api/v1/cases/${c.id}/photos/${id}`, { reference: scale }), 404);
    expect((await photos(owner, c.id))[0].reference).toBeNull();
  });
});

describe("a case profile's photos", () => {
  it("are removed with the case profile: rows and files", async () => {
    const c = await newCase(owner);
    const ids = [await upload(owner, c.id, { reference: rectangle }), await upload(owner, c.id)];
    for (const id of ids) expect(storedFiles(id).length).toBeGreaterThan(0);
    expect(await countRows("case_photo", { case_id: c.id })).toBe(2);

    expect((await del(owner, `/api/v1/cases/${c.id}`)).status).toBe(204);
    expect(await countRows("case_photo", { case_id: c.id })).toBe(0);
    expect(await countRows("case_profile", { id: c.id })).toBe(0);
    for (const id of ids) expect(storedFiles(id)).toEqual([]);
  });

  it("are kept when the case profile is archived", async () => {
    const c = await newCase(owner);
    const id = await upload(owner, c.id);
    ok(await owner.post(`/api/v1/cases/${c.id}/archive`));
    expect(await countRows("case_photo", { case_id: c.id })).toBe(1);
    expect(storedFiles(id).length).toBeGreaterThan(0);
  });

  it("stay, files and all, when the case profile cannot be deleted because a study uses it", async () => {
    const c = await newCase(owner);
    const id = await upload(owner, c.id);
    const kit = await newKit(owner);
    ok(await owner.post("/api/v1/studies", { name: `Photo study ${c.id}`, caseId: c.id, kitIds: [kit.id] }), 201);
    expectError(await del(owner, `/api/v1/cases/${c.id}`), 409, "in_use");
    expect(await countRows("case_photo", { case_id: c.id })).toBe(1);
    expect(storedFiles(id).length).toBeGreaterThan(0);
  });
});

describe("the crank chamber of a case profile", () => {
  const crank = { deckToAxisMm: 60, webRadiusMm: 30, webSpanMm: 80 };

  it("is kept as sent and checked by the study", async () => {
    const c = await newCase(owner, undefined, { data: { ...caseData(), crank } });
    const read = ok<{ item: Row & { data: { crank?: unknown } } }>(await owner.get(`/api/v1/cases/${c.id}`));
    expect(read.item.data.crank).toEqual(crank);
    const kit = await newKit(owner);
    const study = ok<{ item: Row }>(await owner.post("/api/v1/studies", { name: `Crank study ${c.id}`, caseId: c.id, kitIds: [kit.id] }), 201).item;
    type Results = { result: { case: { crankChecked: boolean }; kits: { crank: { checked: boolean; clearanceMm: number | null; edgeDepthMm: number | null } }[] } };
    const { result } = ok<Results>(await owner.get(`/api/v1/studies/${study.id}/results`));
    expect(result.case.crankChecked).toBe(true);
    const k = result.kits[0].crank;
    expect(k.checked).toBe(true);
    // Hand calculation: with the webs wider (span/2 = 40 mm) than the skirt radius (about 27 mm), the skirt's
    // edge comes nearest the webs straight above the axis, so clearance = deck-to-axis − edge depth − web radius.
    expect(k.edgeDepthMm).not.toBeNull();
    expect(k.clearanceMm).toBeCloseTo(crank.deckToAxisMm - (k.edgeDepthMm ?? Number.NaN) - crank.webRadiusMm, 6);
  });

  it("with one length missing is refused at that length, and nothing is written", async () => {
    const name = `Crank refused ${Date.now().toString(36)}`;
    const refused = expectError(await owner.post("/api/v1/cases", { name, data: { ...caseData(), crank: { deckToAxisMm: 60, webRadiusMm: 30 } } }), 400, "invalid_input");
    expect(Object.keys(refused.error.fields ?? {})).toEqual(["data.crank.webSpanMm"]);
    expect(await countRows("case_profile", { name })).toBe(0);
  });

  it("can be removed again by a change that leaves it out of the data", async () => {
    const c = await newCase(owner, undefined, { data: { ...caseData(), crank } });
    const changed = ok<{ item: Row & { data: { crank?: unknown } } }>(await patch(owner, `/api/v1/cases/${c.id}`, { version: c.version, data: caseData() }));
    expect(changed.item.data.crank).toBeUndefined();
  });
});
