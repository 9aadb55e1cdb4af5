import { mkdirSync } from "node:fs";
import { dirname, resolve } from "node:path";

export const DEFAULT_DATABASE_URL = "file:./data/borewright.db";

/** Where the database lives: an embedded file under data/ by default, or a libSQL server URL with its token. */
export function databaseConfig(env: NodeJS.ProcessEnv = process.env) {
  const url = env.DATABASE_URL || DEFAULT_DATABASE_URL;
  const isFile = url.startsWith("file:");
  if (isFile) {
    const path = url.slice("file:".length);
    if (path && path !== ":memory:") mkdirSync(dirname(resolve(path)), { recursive: true });
  }
  return { url, authToken: env.DATABASE_AUTH_TOKEN || undefined, isFile };
}
