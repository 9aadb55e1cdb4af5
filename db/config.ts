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

/** The public address of the app, used in mailed links and as the first trusted origin. */
export function appUrl(env: NodeJS.ProcessEnv = process.env): string {
  return (env.BETTER_AUTH_URL || "http://localhost:3000").replace(/\/$/, "");
}

/** The origins a browser may call the app from: the app's own (localhost and 127.0.0.1 alike) and TRUSTED_ORIGINS. */
export function trustedOrigins(env: NodeJS.ProcessEnv = process.env): string[] {
  const base = new URL(appUrl(env));
  const origins = new Set([base.origin]);
  // localhost and 127.0.0.1 are the same machine; a browser may use either.
  const port = base.port ? `:${base.port}` : "";
  if (base.hostname === "localhost") origins.add(`${base.protocol}//127.0.0.1${port}`);
  if (base.hostname === "127.0.0.1") origins.add(`${base.protocol}//localhost${port}`);
  for (const extra of (env.TRUSTED_ORIGINS ?? "").split(",").map((s) => s.trim()).filter(Boolean)) origins.add(new URL(extra).origin);
  return [...origins];
}
