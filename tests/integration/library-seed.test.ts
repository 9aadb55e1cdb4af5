import { createClient } from "@libsql/client";
import { drizzle } from "drizzle-orm/libsql";
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { applyMigrations } from "../../db/migrate";
import * as schema from "../../db/schema";
import { DEMO_PEOPLE, DEMO_SHOP, seedDemo } from "../../db/seed";
import { DEMO_CASES, DEMO_KITS, DEMO_STUDIES, seedLibrary } from "../../db/seed-library";

const dir = mkdtempSync(join(tmpdir(), "borewright-seed-"));
const url = `file:${join(dir, "seed.db")}`;
const client = createClient({ url, timeout: 10_000 });
const db = drizzle(client, { schema });
const [owner, builder] = DEMO_PEOPLE;

beforeAll(async () => {
  await applyMigrations({ ...process.env, DATABASE_URL: url });
  await seedDemo(db);
});
afterAll(() => {
  client.close();
  rmSync(dir, { recursive: true, force: true });
});

const count = async (table: string) => Number((await client.execute(`select count(*) as n from ${table} where organization_id = '${DEMO_SHOP.id}'`)).rows[0]?.n);

describe("the demo library", () => {
  it("is seeded once: a second run writes nothing", async () => {
    expect(await seedLibrary(db, DEMO_SHOP.id, owner, builder)).toBeGreaterThan(0);
    const counts = await Promise.all(["case_profile", "cylinder_kit", "boring_rig", "study"].map(count));
    expect(await seedLibrary(db, DEMO_SHOP.id, owner, builder)).toBe(0);
    expect(await Promise.all(["case_profile", "cylinder_kit", "boring_rig", "study"].map(count))).toEqual(counts);
    expect(counts[0]).toBeGreaterThanOrEqual(3);
    expect(counts[1]).toBeGreaterThanOrEqual(8);
    expect(counts[2]).toBeGreaterThanOrEqual(2);
    expect(counts[3]).toBeGreaterThanOrEqual(3);
  });

  it("has a round-mouth case, a polygon deck with pockets, eight different bores and a five-kit study", () => {
    expect(DEMO_CASES.some((c) => c.data.mouth.outline.kind === "circle")).toBe(true);
    expect(DEMO_CASES.some((c) => c.data.deck.kind === "polygon" && (c.data.pockets?.length ?? 0) > 0)).toBe(true);
    expect(new Set(DEMO_KITS.map((k) => k.data.boreMm)).size).toBe(DEMO_KITS.length);
    expect(DEMO_STUDIES.some((s) => s.kitIds.length === 5)).toBe(true);
  });

  it("evaluates through the data layer, and the five-kit study shows a kit that fits, one that needs a cut and one that cannot be made safe", async () => {
    process.env.DATABASE_URL = url;
    const { evaluateStoredStudy } = await import("../../db/studies");
    for (const s of DEMO_STUDIES) {
      const evaluated = await evaluateStoredStudy(DEMO_SHOP.id, s.id);
      expect(evaluated?.result.kits.map((k) => k.kitId)).toEqual(s.kitIds);
    }
    const five = await evaluateStoredStudy(DEMO_SHOP.id, DEMO_STUDIES.find((s) => s.kitIds.length === 5)!.id);
    expect(new Set(five?.result.kits.map((k) => k.verdict))).toEqual(new Set(["fits-as-is", "fits-after-cut", "cannot-fit"]));
    // The round mouth's smallest reading is the diameter the core uses.
    const marlet = await evaluateStoredStudy(DEMO_SHOP.id, "demo-study-marlet");
    expect(marlet?.study.case.mouth.outline).toMatchObject({ kind: "circle", diameterMm: 45.98 });
  });
});
