// The demo jobs tell one story in two places: a job's own columns (when its plan was taken, shared, approved,
// paid for, when its after-cut readings were taken) and its history. The same step shows the same time in both.
import { createClient } from "@libsql/client";
import { drizzle } from "drizzle-orm/libsql";
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { applyMigrations } from "@/db/migrate";
import * as schema from "@/db/schema";
import * as jobTables from "@/db/schema-jobs";
import { seedEverything } from "@/db/seed";

const dir = mkdtempSync(join(tmpdir(), "borewright-seed-times-"));
const url = `file:${join(dir, "seed.db")}`;
const client = createClient({ url });
const db = drizzle(client, { schema });

beforeAll(async () => {
  await applyMigrations({ ...process.env, DATABASE_URL: url });
  await seedEverything(db);
}, 60_000);

afterAll(() => {
  client.close();
  rmSync(dir, { recursive: true, force: true });
});

describe("the demo jobs' times", () => {
  it("each step's column and its history event agree", async () => {
    const jobs = await db.select().from(jobTables.job);
    const events = await db.select().from(jobTables.jobEvent);
    const readings = await db.select().from(jobTables.jobReading);
    expect(jobs.length).toBeGreaterThan(0);
    let compared = 0;
    for (const j of jobs) {
      const mine = events.filter((e) => e.jobId === j.id);
      const at = (pred: (e: (typeof mine)[number]) => boolean) => mine.find(pred)?.at?.getTime();
      expect(at((e) => e.kind === "created")).toBe(j.createdAt.getTime());
      if (j.planJson) {
        expect(at((e) => e.toStatus === "planned")).toBe(Date.parse((JSON.parse(j.planJson) as { takenAt: string }).takenAt));
        expect(at((e) => e.kind === "share")).toBe(j.sharedAt?.getTime());
        compared++;
      }
      if (j.approvedAt) {
        expect(at((e) => e.toStatus === "approved")).toBe(j.approvedAt.getTime());
        expect(at((e) => e.kind === "payment")).toBe(j.paidAt?.getTime());
      }
      const r = readings.find((x) => x.jobId === j.id);
      if (r) expect(at((e) => e.kind === "readings")).toBe(r.takenAt.getTime());
    }
    expect(compared).toBeGreaterThan(3);
  });
});
