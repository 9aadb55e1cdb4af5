import { beforeAll, describe, expect, it } from "vitest";
import { StudySchema } from "../../geometry";
import { Http } from "../support/http";
import {
  caseData,
  del,
  expectError,
  freshShopOwner,
  kitData,
  newCase,
  newKit,
  newRig,
  newStudy,
  ok,
  patch,
  rigData,
  shopCounts,
  type Row,
} from "./library-fixtures";

type Page = { items: Row[]; page: number; pageSize: number; total: number };

let owner: Http;
beforeAll(async () => {
  owner = await freshShopOwner("Library Owner");
});

describe("case profiles", () => {
  it("are created with a version, a creator, timestamps, and mouth readings stamped with who took them", async () => {
    const res = await owner.post("/api/v1/cases", { name: "Round-mouth case", notes: "left half", data: caseData(), mouthReadingsMm: [46.1, 46.02, 46.05] });
    const { item } = ok<{ item: Row & { data: { name: string }; mouthReadingsMm: { valueMm: number; takenBy: { name: string }; takenAt: string }[] } }>(res, 201);
    expect(item).toMatchObject({ name: "Round-mouth case", notes: "left half", version: 1, archivedAt: null, createdBy: { name: "Library Owner" } });
    expect(item.data.name).toBe("Round-mouth case");
    expect(Date.parse(item.createdAt as string)).toBeGreaterThan(Date.now() - 60_000);
    expect(item.mouthReadingsMm.map((r) => r.valueMm)).toEqual([46.1, 46.02, 46.05]);
    expect(item.mouthReadingsMm.every((r) => r.takenBy.name === "Library Owner" && !Number.isNaN(Date.parse(r.takenAt)))).toBe(true);
    const again = ok<{ item: Row }>(await owner.get(`/api/v1/cases/${item.id}`));
    expect(again.item).toEqual(item);
  });

  it("refuses an update that names a stale version with 409, and keeps the newer change", async () => {
    const row = await newCase(owner);
    const first = ok<{ item: Row }>(await patch(owner, `/api/v1/cases/${row.id}`, { version: 1, name: "Renamed once" }));
    expect(first.item.version).toBe(2);
    const stale = expectError(await patch(owner, `/api/v1/cases/${row.id}`, { version: 1, name: "Renamed from a stale copy" }), 409, "conflict");
    expect(stale.error.message).toMatch(/someone else changed/i);
    const now = ok<{ item: Row }>(await owner.get(`/api/v1/cases/${row.id}`));
    expect(now.item).toMatchObject({ name: "Renamed once", version: 2 });
  });

  it("names each bad field of a body, including the core's own checks, and writes nothing", async () => {
    const before = await shopCounts(owner);
    const data = { ...caseData(), studHoleDiameterMm: -1, studs: [{ label: "a", positionMm: [1, 1] }, { label: "a", positionMm: [2, 2] }] };
    const body = expectError(await owner.post("/api/v1/cases", { name: "", data, extra: 1 }), 400, "invalid_input");
    expect(Object.keys(body.error.fields ?? {})).toEqual(expect.arrayContaining(["name", "data.studHoleDiameterMm", "(body)"]));
    const dupes = expectError(await owner.post("/api/v1/cases", { name: "Dupes", data: { ...caseData(), studs: data.studs } }), 400);
    expect(dupes.error.fields?.["data.studs.1.label"]).toMatch(/duplicate/);
    expect(await shopCounts(owner)).toEqual(before);
  });

  it("pages, sorts and filters by name, and hides archived rows unless asked", async () => {
    const shop = await freshShopOwner("Pager");
    for (const name of ["Delta case", "alpha case", "Charlie case", "bravo case", "Echo other"]) await newCase(shop, name);
    const byName = ok<Page>(await shop.get("/api/v1/cases?sort=name&dir=asc&pageSize=2&page=2"));
    expect(byName).toMatchObject({ page: 2, pageSize: 2, total: 5 });
    expect(byName.items.map((r) => r.name)).toEqual(["Charlie case", "Delta case"]);
    const filtered = ok<Page>(await shop.get("/api/v1/cases?q=CASE&sort=name&dir=desc"));
    expect(filtered.items.map((r) => r.name)).toEqual(["Delta case", "Charlie case", "bravo case", "alpha case"]);
    const echo = byName.items.length ? ok<Page>(await shop.get("/api/v1/cases?q=echo")).items[0] : undefined;
    ok(await shop.post(`/api/v1/cases/${echo?.id}/archive`));
    expect(ok<Page>(await shop.get("/api/v1/cases")).total).toBe(4);
    const archived = ok<Page>(await shop.get("/api/v1/cases?archived=1"));
    expect(archived.items.map((r) => r.name)).toEqual(["Echo other"]);
    expect(archived.items[0].archivedAt).toEqual(expect.any(String));
    const restored = ok<{ item: Row }>(await shop.post(`/api/v1/cases/${echo?.id}/restore`));
    expect(restored.item.archivedAt).toBeNull();
    expect(ok<Page>(await shop.get("/api/v1/cases")).total).toBe(5);
  });

  it("answers an unknown sort field or a page size over 100 with 400 naming the parameter", async () => {
    expect(expectError(await owner.get("/api/v1/cases?sort=password"), 400).error.fields).toHaveProperty("sort");
    expect(expectError(await owner.get("/api/v1/kits?pageSize=101"), 400).error.fields).toHaveProperty("pageSize");
    expect(expectError(await owner.get("/api/v1/studies?page=0"), 400).error.fields).toHaveProperty("page");
  });

  it("are deleted when no study uses them, and then are gone", async () => {
    const row = await newCase(owner);
    const res = await del(owner, `/api/v1/cases/${row.id}`);
    expect(res.status).toBe(204);
    expectError(await owner.get(`/api/v1/cases/${row.id}`), 404, "not_found");
    expectError(await del(owner, `/api/v1/cases/${row.id}`), 404);
  });
});

describe("cylinder kits", () => {
  it("sort by bore, and keep who took each skirt reading when another person adds one", async () => {
    const shop = await freshShopOwner("Kit Owner");
    for (const [bore, skirt] of [[50, 57.4], [41, 47], [47, 53.9]]) await newKit(shop, bore, skirt);
    const sorted = ok<Page>(await shop.get("/api/v1/kits?sort=boreMm&dir=asc"));
    expect(sorted.items.map((k) => (k.data as { boreMm: number }).boreMm)).toEqual([41, 47, 50]);

    type KitRow = Row & { readings: { skirtDiameter: { valueMm: number; takenBy: { name: string }; takenAt: string }[] } };
    const kit = sorted.items[0] as KitRow;
    const firstStamp = kit.readings.skirtDiameter[0];
    expect(firstStamp.takenBy.name).toBe("Kit Owner");
    await new Promise((r) => setTimeout(r, 5));
    const data = { ...kitData(41, 47), skirtDiameterReadingsMm: [47, 47.2] };
    const { item } = ok<{ item: KitRow }>(await patch(shop, `/api/v1/kits/${kit.id}`, { version: kit.version, data }));
    expect(item.readings.skirtDiameter.map((r) => r.valueMm)).toEqual([47, 47.2]);
    expect(item.readings.skirtDiameter[0]).toEqual(firstStamp);
    expect(Date.parse(item.readings.skirtDiameter[1].takenAt)).toBeGreaterThan(Date.parse(firstStamp.takenAt));
  });

  it("refuses a kit without skirt readings, naming the field", async () => {
    const data: Record<string, unknown> = kitData(47, 53.9);
    delete data.skirtDiameterReadingsMm;
    expect(expectError(await owner.post("/api/v1/kits", { name: "No readings", data }), 400).error.fields).toHaveProperty("data.skirtDiameterReadingsMm");
  });
});

describe("boring rigs", () => {
  it("go through create, read, update, archive, restore and delete", async () => {
    const rig = await newRig(owner);
    const changed = ok<{ item: Row & { data: { drillTopRpm: number } } }>(await patch(owner, `/api/v1/rigs/${rig.id}`, { version: 1, data: { ...rigData(), drillTopRpm: 3000 } }));
    expect(changed.item).toMatchObject({ version: 2, data: { drillTopRpm: 3000 } });
    expect(ok<{ item: Row }>(await owner.post(`/api/v1/rigs/${rig.id}/archive`)).item).toMatchObject({ version: 3, archivedAt: expect.any(String) });
    expect(ok<{ item: Row }>(await owner.post(`/api/v1/rigs/${rig.id}/restore`)).item).toMatchObject({ version: 4, archivedAt: null });
    expect((await del(owner, `/api/v1/rigs/${rig.id}`)).status).toBe(204);
  });
});

describe("studies", () => {
  it("assemble the core's Study from the library, with the smallest mouth reading as the mouth", async () => {
    const caseRow = await newCase(owner, "Measured case", { mouthReadingsMm: [46.2, 45.9, 46.0] });
    const kit = await newKit(owner, 47, 53.92);
    const created = ok<{ item: Row }>(await owner.post("/api/v1/studies", { name: "Assembly", caseId: caseRow.id, kitIds: [kit.id] }), 201);
    expect(created.item).toMatchObject({ version: 1, caseId: caseRow.id, caseName: "Measured case", kitIds: [kit.id], rigId: null, cut: null, chosenKitId: null });
    const { study } = ok<{ study: unknown }>(await owner.get(`/api/v1/studies/${created.item.id}`));
    const parsed = StudySchema.parse(study);
    expect(parsed.case.name).toBe("Measured case");
    expect(parsed.case.mouth.outline).toMatchObject({ kind: "circle", diameterMm: 45.9 });
    expect(parsed.kits.map((k) => [k.id, k.name])).toEqual([[kit.id, kit.name]]);
  });

  it("evaluate on the server with the core: one verdict per kit", async () => {
    const { study, kits } = await newStudy(owner);
    const { result } = ok<{ result: { kits: { kitId: string; verdict: string }[] } }>(await owner.get(`/api/v1/studies/${study.id}/results`));
    expect(result.kits.map((k) => k.kitId)).toEqual(kits.map((k) => k.id));
    // The core on the same rows: the Ø53.92 skirt fits after a cut; the Ø57.4 skirt needs a cut thinner-walled than the case allows.
    expect(result.kits.map((k) => k.verdict)).toEqual(["fits-after-cut", "cannot-fit"]);
  });

  it("answer results that follow every change to the study, its kits and the shop's limits", async () => {
    type Results = { result: { kits: { skirt: { diameterMm: number } }[]; limits: { values: { minWallMm: number } } } };
    const shop = await freshShopOwner("Results Owner");
    const { study, kits } = await newStudy(shop);
    const first = ok<Results>(await shop.get(`/api/v1/studies/${study.id}/results`)).result;
    expect(first.kits[0].skirt.diameterMm).toBeCloseTo(53.95, 6);
    ok(await patch(shop, `/api/v1/kits/${kits[0].id}`, { version: kits[0].version, data: kitData(47, 54.5) }));
    const second = ok<Results>(await shop.get(`/api/v1/studies/${study.id}/results`)).result;
    expect(second.kits[0].skirt.diameterMm).toBeCloseTo(54.53, 6);
    const settings = ok<{ version: number }>(await shop.get("/api/v1/settings"));
    ok(await patch(shop, "/api/v1/settings", { version: settings.version, limits: { minWallMm: 3.5 } }));
    expect(ok<Results>(await shop.get(`/api/v1/studies/${study.id}/results`)).result.limits.values.minWallMm).toBe(3.5);
    ok(await patch(shop, `/api/v1/studies/${study.id}`, { version: 1, limits: { minWallMm: 1.5 } }));
    expect(ok<Results>(await shop.get(`/api/v1/studies/${study.id}/results`)).result.limits.values.minWallMm).toBe(1.5);
  });

  it("refuse a stale update with 409 and change nothing; a fresh one is written with its history", async () => {
    const { study, kits } = await newStudy(owner);
    const first = ok<{ item: Row }>(await patch(owner, `/api/v1/studies/${study.id}`, { version: 1, cut: { diameterMm: 54, depthMm: 25 } }));
    expect(first.item.version).toBe(2);
    const second = ok<{ item: Row }>(await patch(owner, `/api/v1/studies/${study.id}`, { version: 2, cut: { diameterMm: 54.5, depthMm: 25 }, chosenKitId: kits[1].id }));
    expect(second.item).toMatchObject({ version: 3, chosenKitId: kits[1].id });
    const counts = await shopCounts(owner);
    expectError(await patch(owner, `/api/v1/studies/${study.id}`, { version: 2, kitIds: [kits[0].id], name: "stale" }), 409, "conflict");
    const now = ok<{ item: Row }>(await owner.get(`/api/v1/studies/${study.id}`));
    expect(now.item).toMatchObject({ version: 3, kitIds: kits.map((k) => k.id), name: study.name });
    expect(await shopCounts(owner)).toEqual(counts);

    const { items } = ok<{ items: { summary: string; by: { name: string }; at: string }[] }>(await owner.get(`/api/v1/studies/${study.id}/history`));
    const summaries = items.map((i) => i.summary);
    expect(summaries[0]).toMatch(/cut diameter 54\.0 → 54\.5 mm|chose kit/);
    expect(summaries).toContain("cut diameter 54.0 → 54.5 mm");
    expect(summaries).toContain(`chose kit ${kits[1].name}`);
    expect(summaries).toContain("cut diameter proposed → 54.0 mm");
    expect(summaries[summaries.length - 1]).toBe("created the study");
    expect(items.every((i) => i.by.name === "Library Owner")).toBe(true);
  });

  it("take out the chosen kit's choice when the kit leaves, and refuse a choice outside the kits", async () => {
    const { study, kits } = await newStudy(owner);
    expect(expectError(await patch(owner, `/api/v1/studies/${study.id}`, { version: 1, chosenKitId: "not-a-kit" }), 400).error.fields).toHaveProperty("chosenKitId");
    const chosen = ok<{ item: Row }>(await patch(owner, `/api/v1/studies/${study.id}`, { version: 1, chosenKitId: kits[0].id }));
    const removed = ok<{ item: Row }>(await patch(owner, `/api/v1/studies/${study.id}`, { version: chosen.item.version, kitIds: [kits[1].id] }));
    expect(removed.item).toMatchObject({ kitIds: [kits[1].id], chosenKitId: null });
    const { items } = ok<{ items: { summary: string }[] }>(await owner.get(`/api/v1/studies/${study.id}/history`));
    expect(items.map((i) => i.summary)).toEqual(expect.arrayContaining([`removed kit ${kits[0].name}`, "cleared the chosen kit"]));
  });

  it("refuse references outside the shop and holder readings at studs the case does not have", async () => {
    const other = await freshShopOwner("Other Shop");
    const foreignKit = await newKit(other);
    const mine = await newCase(owner);
    const body = expectError(
      await owner.post("/api/v1/studies", {
        name: "Mixed",
        caseId: mine.id,
        kitIds: [foreignKit.id],
        readings: { holderHeights: [{ stud: "nowhere", heightMm: 10 }] },
      }),
      400,
    );
    expect(body.error.fields).toMatchObject({ "kitIds.0": expect.any(String), "readings.holderHeights.0.stud": expect.any(String) });
    expect(body.error.fields?.["kitIds.0"]).not.toMatch(/other shop/i);
  });

  it("refuse to delete a case, kit or rig a study uses, naming the study, even once the study is archived", async () => {
    const { study, caseRow, kits, rig } = await newStudy(owner);
    ok(await owner.post(`/api/v1/studies/${study.id}/archive`));
    for (const path of [`/api/v1/cases/${caseRow.id}`, `/api/v1/kits/${kits[0].id}`, `/api/v1/rigs/${rig.id}`]) {
      const body = expectError(await del(owner, path), 409, "in_use");
      expect(body.error.message).toContain(study.name);
      ok(await owner.get(path));
    }
  });

  it("are archived and restored, never deleted, and duplicated as a copy with their kits", async () => {
    const { study } = await newStudy(owner, { cut: { diameterMm: 55 } });
    const archived = ok<{ item: Row }>(await owner.post(`/api/v1/studies/${study.id}/archive`));
    expect(archived.item.archivedAt).toEqual(expect.any(String));
    const live = ok<Page>(await owner.get(`/api/v1/studies?q=${encodeURIComponent(study.name)}`));
    expect(live.total).toBe(0);
    expect(ok<Page>(await owner.get(`/api/v1/studies?archived=1&q=${encodeURIComponent(study.name)}`)).total).toBe(1);
    ok(await owner.post(`/api/v1/studies/${study.id}/restore`));
    expect((await del(owner, `/api/v1/studies/${study.id}`)).status).toBe(405);

    const copy = ok<{ item: Row }>(await owner.post(`/api/v1/studies/${study.id}/duplicate`), 201);
    expect(copy.item).toMatchObject({ name: `${study.name} (copy)`, version: 1, kitIds: study.kitIds, cut: { diameterMm: 55 } });
    expect(copy.item.id).not.toBe(study.id);
  });

  it("export as the fit CLI's JSON, and import back into another shop with the same results", async () => {
    const { study } = await newStudy(owner, { cut: { diameterMm: 54.6, depthMm: 25.5 }, limits: { minWallMm: 2.5 } });
    const exported = await owner.get(`/api/v1/studies/${study.id}/export`);
    expect(exported.status).toBe(200);
    expect(exported.headers.get("content-disposition")).toMatch(/attachment; filename=".*\.study\.json"/);
    const file = StudySchema.parse(exported.json);
    expect(file.limits?.minWallMm).toBe(2.5);

    const other = await freshShopOwner("Second Shop");
    const imported = ok<{ item: Row }>(await other.post("/api/v1/studies/import", exported.json), 201);
    const original = ok<{ result: { kits: unknown[] } }>(await owner.get(`/api/v1/studies/${study.id}/results`)).result;
    const copy = ok<{ result: { kits: { kitId: string }[] } }>(await other.get(`/api/v1/studies/${imported.item.id}/results`)).result;
    const strip = (r: { kits: unknown[] }) => JSON.parse(JSON.stringify(r, (k, v) => (k === "kitId" ? undefined : v)));
    expect(strip(copy)).toEqual(strip(original));
    expect(ok<Page>(await other.get("/api/v1/kits")).total).toBe(2);
  });

  it("refuse a bad study file with each bad field by its JSON path, writing nothing", async () => {
    const exported = await owner.get(`/api/v1/studies/${(await newStudy(owner)).study.id}/export`);
    const file = exported.json as { kits: { boreMm: unknown }[] };
    file.kits[0].boreMm = "forty-seven";
    const before = await shopCounts(owner);
    const body = expectError(await owner.post("/api/v1/studies/import", file), 400);
    expect(body.error.fields).toHaveProperty("kits.0.boreMm");
    expect(await shopCounts(owner)).toEqual(before);
  });

  it("answer 422 for results of a study with no kit yet, naming why", async () => {
    const caseRow = await newCase(owner);
    const created = ok<{ item: Row }>(await owner.post("/api/v1/studies", { name: "Empty so far", caseId: caseRow.id, kitIds: [] }), 201);
    const body = expectError(await owner.get(`/api/v1/studies/${created.item.id}/results`), 422);
    expect(body.error.message).toMatch(/at least one kit/i);
  });
});

describe("shop settings", () => {
  it("fill every limit, name the defaulted ones, and lay the shop's limits under each study's own", async () => {
    const shop = await freshShopOwner("Settings Owner");
    const start = ok<{ settings: { units: string; limits: Record<string, number>; defaulted: string[] }; version: number }>(await shop.get("/api/v1/settings"));
    expect(start.settings.defaulted).toContain("minWallMm");
    expect(start.settings.limits.minWallMm).toEqual(expect.any(Number));
    const changed = ok<typeof start>(await patch(shop, "/api/v1/settings", { version: start.version, units: "in", limits: { minWallMm: 3, minSealingLandMm: 2.5 } }));
    expect(changed).toMatchObject({ version: start.version + 1, settings: { units: "in", limits: { minWallMm: 3, minSealingLandMm: 2.5 } } });
    expect(changed.settings.defaulted).not.toContain("minWallMm");
    expectError(await patch(shop, "/api/v1/settings", { version: start.version, units: "mm" }), 409, "conflict");
    // A lowest cutting speed above the default highest one does not hold together once the defaults are filled.
    const crossed = expectError(await patch(shop, "/api/v1/settings", { version: changed.version, limits: { cuttingSpeedMinMPerMin: 400 } }), 400);
    expect(crossed.error.fields).toHaveProperty(["limits.cuttingSpeedMaxMPerMin"]);
    expect(ok<typeof start>(await shop.get("/api/v1/settings")).version).toBe(changed.version);

    const { study } = await newStudy(shop, { limits: { minSealingLandMm: 1.5 } });
    const assembled = ok<{ study: { limits: Record<string, number> } }>(await shop.get(`/api/v1/studies/${study.id}`)).study;
    expect(assembled.limits).toMatchObject({ minWallMm: 3, minSealingLandMm: 1.5 });
  });
});

describe("the fit endpoint and the API description", () => {
  it("evaluates a study sent in the body, and names each bad field of a bad one", async () => {
    const { study } = await newStudy(owner);
    const file = (await owner.get(`/api/v1/studies/${study.id}/export`)).json as Record<string, unknown>;
    const { result } = ok<{ result: { kits: unknown[] } }>(await owner.post("/api/v1/fit", file));
    expect(result.kits).toHaveLength(2);
    expect(expectError(await owner.post("/api/v1/fit", { ...file, kits: [] }), 400).error.fields).toHaveProperty("kits");
  });

  it("serves an OpenAPI 3.1 document listing the library and studies routes", async () => {
    const doc = ok<{ openapi: string; paths: Record<string, Record<string, { requestBody?: unknown }>> }>(await new Http().get("/api/v1/openapi.json"));
    expect(doc.openapi).toBe("3.1.0");
    for (const p of ["/api/v1/cases", "/api/v1/kits/{id}", "/api/v1/studies/{id}/results", "/api/v1/studies/{id}/duplicate", "/api/v1/library/import", "/api/v1/settings"]) {
      expect(doc.paths).toHaveProperty([p]);
    }
    expect(doc.paths["/api/v1/cases"].post.requestBody).toBeDefined();
    expect(doc.paths["/api/v1/cases/{id}"]).toHaveProperty("delete");
  });
});
