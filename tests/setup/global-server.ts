// Starts what the integration and browser tests talk to: a fresh file database in a temporary folder,
// the local mail sink, and the production build served by `next start` on 127.0.0.1.
import { randomBytes } from "node:crypto";
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import type { TestProject } from "vitest/node";
import { createClient } from "@libsql/client";
import { drizzle } from "drizzle-orm/libsql";
import { applyMigrations } from "../../db/migrate";
import * as schema from "../../db/schema";
import { seedDemo } from "../../db/seed";
import { freePort, startNext, waitFor } from "../../scripts/lib.mjs";
import { startMailSink } from "../../scripts/mail-sink.mjs";

declare module "vitest" {
  export interface ProvidedContext {
    baseURL: string;
    mailURL: string;
    databaseURL: string;
  }
}

export default async function setup(project: TestProject) {
  const dir = mkdtempSync(join(tmpdir(), "borewright-test-"));
  const databaseURL = `file:${join(dir, "test.db")}`;
  await applyMigrations({ ...process.env, DATABASE_URL: databaseURL });
  const seedClient = createClient({ url: databaseURL });
  await seedDemo(drizzle(seedClient, { schema }));
  seedClient.close();

  const sink = await startMailSink({ smtpPort: 0, httpPort: 0, quiet: true });
  const port = await freePort();
  const baseURL = `http://127.0.0.1:${port}`;
  const server = startNext({
    port,
    quiet: true,
    env: {
      DATABASE_URL: databaseURL,
      BETTER_AUTH_URL: baseURL,
      // A secret of this run only; the payment fake's key and webhook secret come from global-jobs.ts.
      BETTER_AUTH_SECRET: randomBytes(32).toString("base64url"),
      // Each simulated person sends its own X-Forwarded-For, as one trusted proxy in front of the app would.
      TRUSTED_PROXY_HOPS: "1",
      SMTP_HOST: sink.host,
      SMTP_PORT: String(sink.smtpPort),
      SMTP_IGNORE_TLS: "true",
      MAIL_SINK_URL: sink.url,
    },
  }) as ReturnType<typeof startNext> & { log: () => string };
  try {
    await waitFor(`${baseURL}/sign-in`, 60_000, server);
  } catch (error) {
    server.kill("SIGTERM");
    await sink.stop();
    console.error(server.log());
    throw error;
  }

  project.provide("baseURL", baseURL);
  project.provide("mailURL", sink.url);
  project.provide("databaseURL", databaseURL);

  return async () => {
    server.kill("SIGTERM");
    await sink.stop();
    if (process.env.KEEP_TEST_DB !== "1") rmSync(dir, { recursive: true, force: true });
    else console.log(`test database kept at ${databaseURL}`);
  };
}
