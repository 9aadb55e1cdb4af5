import { createClient } from "@libsql/client";
import { drizzle } from "drizzle-orm/libsql";
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { evaluateInBrowser } from "../../app/(shop)/studies/[id]/_components/assemble";
import { studyDefaults } from "../../app/(shop)/studies/[id]/_components/study-values";
import { readStudyInputs } from "../../app/(shop)/studies/[id]/_components/use-study-inputs";
import type { Caller } from "../../db/access";
import { applyMigrations } from "../../db/migrate";
import * as schema from "../../db/schema";
import { DEMO_SHOP, seedEverything } from "../../db/seed";
import { shopOwnLimits } from "../../model/study-assembly";
import { readStudyText } from "../../scripts/fit";

// One assembler: the server's Study for a stored study (what the API answers, what the export writes) and
// the Study the studio assembles in the browser from the same rows, through its own form, are equal.

const dir = mkdtempSync(join(tmpdir(), "borewright-assembly-"));
const url = `file:${join(dir, "assembly.db")}`;
let caller: Caller;

beforeAll(async () => {
  await applyMigrations({ ...process.env, DATABASE_URL: url });
  process.env.DATABASE_URL = url;
  const client = createClient({ url });
  await seedEverything(drizzle(client, { schema }));
  const owner = (await client.execute({ sql: "select u.id, u.name, u.email from member m join user u on u.id = m.user_id where m.organization_id = ? and m.role = 'owner'", args: [DEMO_SHOP.id] })).rows[0];
  client.close();
  caller = { userId: String(owner.id), name: String(owner.name), email: String(owner.email), emailVerified: true, units: "mm", shopId: DEMO_SHOP.id, shopName: DEMO_SHOP.name, role: "owner" };
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe("assembling a study", { timeout: 60_000 }, () => {
  it("gives the same Study on the server, in the export and in the browser, for every demo study", async () => {
    const { listStudies, getStudyWithRows, exportStudy } = await import("../../db/studies");
    const { getSettings, updateSettings } = await import("../../db/settings");
    const { items } = await listStudies(caller, { page: 1, pageSize: 100, archived: "all" });
    expect(items.length).toBeGreaterThan(0);
    // One limit of the shop's own; the rest stay the core's defaults, and the Study says which.
    const settings = await updateSettings(caller, { version: (await getSettings(caller)).version, limits: { minWallMm: 2.5 } });
    let compared = 0;
    for (const listed of items) {
      const { item, study, rows } = await getStudyWithRows(caller, listed.id);
      if (!rows.case) continue;
      // The browser reads the row into its form and back, as the studio does on opening the study.
      const inputs = readStudyInputs(studyDefaults(item, "mm"), "mm");
      expect(inputs, `the form reads study "${item.name}" back`).not.toBeNull();
      const browser = evaluateInBrowser({ name: inputs!.name, caseRow: rows.case, kitRows: rows.kits, rigRow: rows.rig, inputs: inputs!, shopLimits: shopOwnLimits(settings.settings) });
      if (!browser.ok) continue;
      expect(browser.study, `study "${item.name}"`).toEqual(study);
      // The export is the file `npm run fit` reads: as JSON text, it reads back to the same Study.
      const exported = (await exportStudy(caller, item.id)).study;
      expect(exported).toEqual(study);
      expect(readStudyText(JSON.stringify(exported, null, 2))).toEqual({ ok: true, study });
      expect((study as { limits?: unknown }).limits).toMatchObject({ minWallMm: 2.5 });
      compared++;
    }
    expect(compared).toBeGreaterThan(0);
  });
});

describe("a kit row for the core", () => {
  it("keeps the row's id and name and leaves its price (money) behind, so the core's schema takes it", async () => {
    const { kitFromRow } = await import("../../model/study-assembly");
    const { safeParseStudy } = await import("../../geometry");
    const { DEMO_CASES, DEMO_KITS } = await import("../../db/seed-library");
    const row = DEMO_KITS.find((k) => k.data.price !== undefined)!;
    expect(row, "a demo kit with a price").toBeDefined();
    const kit = kitFromRow({ id: row.id, name: row.name, data: row.data });
    expect(kit).toMatchObject({ id: row.id, name: row.name, boreMm: row.data.boreMm });
    expect("price" in kit).toBe(false);
    const parsed = safeParseStudy({ case: { ...DEMO_CASES[0].data, name: DEMO_CASES[0].name }, kits: [kit] });
    expect(parsed.ok, parsed.ok ? "" : parsed.issues[0]?.message).toBe(true);
  });
});
