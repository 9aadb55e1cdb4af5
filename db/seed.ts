// Seeds the invented demo shop. Idempotent: rows are found by their fixed ids first, so a second run changes nothing.
import { createClient } from "@libsql/client";
import { hashPassword } from "better-auth/crypto";
import { eq } from "drizzle-orm";
import { drizzle } from "drizzle-orm/libsql";
import { fileURLToPath } from "node:url";
import { databaseConfig } from "./config";
import { loadLocalEnv } from "./env";
import { applyMigrations } from "./migrate";
import * as schema from "./schema";
import { DEMO_PRICING, seedJobs } from "./seed-jobs";
import { seedLibrary } from "./seed-library";

export const DEMO_SHOP = { id: "demo-shop", name: "Quillfern Engine Works", slug: "quillfern-engine-works" };

export const DEMO_PEOPLE = [
  { id: "demo-owner", name: "Nell Varga", email: "owner@quillfern.test", password: "quillfern-owner-26", role: "owner" },
  { id: "demo-builder", name: "Tomas Brisk", email: "builder@quillfern.test", password: "quillfern-builder-26", role: "builder" },
  { id: "demo-customer", name: "Ivy Harrow", email: "customer@quillfern.test", password: "quillfern-customer-26", role: "customer" },
] as const;

type SeedDb = ReturnType<typeof drizzle<typeof schema>>;

/** Inserts the demo shop and its people where they are missing; returns how many rows it wrote. */
export async function seedDemo(db: SeedDb): Promise<number> {
  let written = 0;
  await db.transaction(async (tx) => {
    const shop = await tx.query.organization.findFirst({ where: eq(schema.organization.id, DEMO_SHOP.id) });
    if (!shop) {
      await tx.insert(schema.organization).values({ ...DEMO_SHOP, createdAt: new Date() });
      await tx.insert(schema.shopSettings).values({ organizationId: DEMO_SHOP.id, ...DEMO_PRICING });
      written += 2;
    }
    for (const person of DEMO_PEOPLE) {
      const existing = await tx.query.user.findFirst({ where: eq(schema.user.id, person.id) });
      if (existing) continue;
      await tx.insert(schema.user).values({ id: person.id, name: person.name, email: person.email, emailVerified: true });
      await tx.insert(schema.account).values({
        id: `${person.id}-credential`,
        accountId: person.id,
        providerId: "credential",
        userId: person.id,
        password: await hashPassword(person.password),
      });
      await tx.insert(schema.member).values({
        id: `${person.id}-member`,
        organizationId: DEMO_SHOP.id,
        userId: person.id,
        role: person.role,
        createdAt: new Date(),
      });
      written += 3;
    }
  });
  return written;
}

/** The whole demo: the shop and its people, its library and studies, and its jobs. */
export async function seedEverything(db: SeedDb): Promise<number> {
  const [owner, builder, customer] = DEMO_PEOPLE;
  let written = await seedDemo(db);
  written += await seedLibrary(db, DEMO_SHOP.id, owner, builder);
  written += await seedJobs(db, DEMO_SHOP.id, { owner, builder, customer });
  return written;
}

/** A new file database at `url`, migrated, holding the demo shop, its people and its library (no jobs): what the benchmarks run against. */
export async function seedBenchDatabase(url: string): Promise<void> {
  await applyMigrations({ ...process.env, DATABASE_URL: url });
  const client = createClient({ url });
  try {
    const [owner, builder] = DEMO_PEOPLE;
    const db = drizzle(client, { schema });
    await seedDemo(db);
    await seedLibrary(db, DEMO_SHOP.id, owner, builder);
  } finally {
    client.close();
  }
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  loadLocalEnv();
  const { url, authToken } = databaseConfig();
  const client = createClient({ url, authToken });
  const db = drizzle(client, { schema });
  seedEverything(db)
    .then((written) => {
      console.log(written ? `demo data seeded (${written} rows)` : "demo data already present; nothing changed");
      console.log(`\nDemo shop: ${DEMO_SHOP.name}`);
      for (const p of DEMO_PEOPLE) console.log(`  ${p.role.padEnd(9)} ${p.email.padEnd(26)} password: ${p.password}`);
    })
    .catch((error: unknown) => {
      console.error("seeding failed:", error instanceof Error ? error.message : error);
      process.exitCode = 1;
    })
    .finally(() => client.close());
}
