// Applies the committed migrations in drizzle/ to DATABASE_URL. Run by the demo, dev and test scripts.
import { createClient } from "@libsql/client";
import { drizzle } from "drizzle-orm/libsql";
import { migrate } from "drizzle-orm/libsql/migrator";
import { fileURLToPath } from "node:url";
import { databaseConfig } from "./config";
import { loadLocalEnv } from "./env";

export async function applyMigrations(env: NodeJS.ProcessEnv = process.env): Promise<void> {
  const { url, authToken, isFile } = databaseConfig(env);
  const client = createClient({ url, authToken });
  try {
    if (isFile) await client.execute("PRAGMA journal_mode = WAL");
    const migrationsFolder = fileURLToPath(new URL("../drizzle", import.meta.url));
    await migrate(drizzle(client), { migrationsFolder });
  } finally {
    client.close();
  }
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  loadLocalEnv();
  applyMigrations()
    .then(() => console.log(`migrations applied to ${databaseConfig().url}`))
    .catch((error: unknown) => {
      console.error("migration failed:", error instanceof Error ? error.message : error);
      process.exit(1);
    });
}
