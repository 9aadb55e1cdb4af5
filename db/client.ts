import "server-only";
import { createClient, type Client } from "@libsql/client";
import { drizzle, type LibSQLDatabase } from "drizzle-orm/libsql";
import * as mainSchema from "./schema";
import * as jobSchema from "./schema-jobs";
import { databaseConfig } from "./config";

const schema = { ...mainSchema, ...jobSchema };

export type Db = LibSQLDatabase<typeof schema>;

type Handle = { client: Client; db: Db; ready: Promise<void> };

// One client per process, kept across hot reloads in development.
const globalForDb = globalThis as unknown as { borewrightDb?: Handle };

function open(): Handle {
  const { url, authToken, isFile } = databaseConfig();
  // libSQL opens every pooled connection with foreign keys on; WAL is a property of the file, set once here.
  // `timeout` is each connection's busy timeout, so concurrent writers wait rather than fail.
  const client = createClient({ url, authToken, timeout: isFile ? 5000 : undefined });
  const ready = isFile ? client.execute("PRAGMA journal_mode = WAL").then(() => undefined) : Promise.resolve();
  return { client, db: drizzle(client, { schema }), ready: ready.then(() => undefined) };
}

function handle(): Handle {
  globalForDb.borewrightDb ??= open();
  return globalForDb.borewrightDb;
}

/** The database, once its connection pragmas have been applied. */
export async function getDb(): Promise<Db> {
  const h = handle();
  await h.ready;
  return h.db;
}

/** The same database synchronously, for the auth adapter, which takes it at start-up. */
export function dbSync(): Db {
  return handle().db;
}

/** The raw libSQL client, for pragmas and health checks. */
export async function getClient(): Promise<Client> {
  const h = handle();
  await h.ready;
  return h.client;
}
