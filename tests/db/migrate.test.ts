import { createClient } from "@libsql/client";
import { drizzle } from "drizzle-orm/libsql";
import { spawnSync } from "node:child_process";
import { cpSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { applyMigrations } from "../../db/migrate";
import * as schema from "../../db/schema";
import { DEMO_PEOPLE, seedEverything } from "../../db/seed";

const dir = mkdtempSync(join(tmpdir(), "borewright-db-"));
const url = `file:${join(dir, "unit.db")}`;

beforeAll(async () => {
  await applyMigrations({ ...process.env, DATABASE_URL: url });
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe("the database client", () => {
  it("opens the file database with foreign keys on and in WAL mode", async () => {
    process.env.DATABASE_URL = url;
    const { getClient } = await import("../../db/client");
    const client = await getClient();
    expect((await client.execute("PRAGMA foreign_keys")).rows[0]?.foreign_keys).toBe(1);
    expect((await client.execute("PRAGMA journal_mode")).rows[0]?.journal_mode).toBe("wal");
    await expect(
      client.execute("insert into member (id, organization_id, user_id, role, created_at) values ('x', 'no-shop', 'no-user', 'builder', 0)"),
    ).rejects.toThrow(/FOREIGN KEY/i);
  });
});

describe("the demo seed", () => {
  it("is idempotent: the second run writes nothing and the row counts stay the same", async () => {
    const client = createClient({ url });
    const db = drizzle(client, { schema });
    const tables = ["user", "member", "organization", "case_profile", "cylinder_kit", "boring_rig", "study", "job"];
    const count = async () => Promise.all(tables.map(async (t) => Number((await client.execute(`select count(*) as n from "${t}"`)).rows[0]?.n)));
    const first = await seedEverything(db);
    expect(first).toBeGreaterThan(0);
    const after = await count();
    expect(after.every((n) => n > 0)).toBe(true);
    expect(await seedEverything(db)).toBe(0);
    expect(await count()).toEqual(after);
    const roles = (await client.execute("select role from member order by role")).rows.map((r) => r.role);
    expect(roles).toEqual(DEMO_PEOPLE.map((p) => p.role).sort());
    client.close();
  });
});

describe("migrations", () => {
  it("are up to date with db/schema.ts: generating again from the committed ones finds no change", () => {
    // drizzle-kit wants a path relative to the project for its output folder.
    const out = join("test-results", `migration-check-${process.pid}`);
    rmSync(out, { recursive: true, force: true });
    cpSync(join(process.cwd(), "drizzle"), out, { recursive: true });
    // The project's own config, pointed at the scratch copy.
    const config = join(out, "drizzle.check.config.ts");
    writeFileSync(
      config,
      readFileSync("drizzle.config.ts", "utf8").replace('out: "./drizzle"', `out: "./${out}"`),
    );
    const result = spawnSync("npx", ["drizzle-kit", "generate", `--config=${config}`], { cwd: process.cwd(), encoding: "utf8" });
    rmSync(out, { recursive: true, force: true });
    expect(result.status).toBe(0);
    expect(result.stdout).toMatch(/No schema changes/i);
  }, 60_000);
});
