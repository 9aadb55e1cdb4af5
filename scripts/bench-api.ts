// The API benchmark: `npm run bench:api [-- --seconds 10 --connections 50]`.
// Starts the production server on 127.0.0.1 against a fresh seeded file database, signs in, and loads it
// with autocannon for a bounded time: reading a study's results (the five-kit demo study) and listing
// studies. In the same run, a bare node:http handler (a child process) reads the same rows through the
// same data layer and libSQL client, without the framework and the session check. Prints requests/s and
// p99 for both, and their ratio. A benchmark, not a test: it reports, and fails only when a request fails.
//
// Run with tsx's react-server condition (the data layer is server-only):
//   tsx --conditions=react-server scripts/bench-api.ts
import autocannon from "autocannon";
import { createClient } from "@libsql/client";
import { drizzle } from "drizzle-orm/libsql";
import { spawn, type ChildProcess } from "node:child_process";
import { randomBytes } from "node:crypto";
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { createServer } from "node:http";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { applyMigrations } from "../db/migrate";
import * as schema from "../db/schema";
import { DEMO_PEOPLE, DEMO_SHOP, seedDemo } from "../db/seed";
import { DEMO_STUDIES, seedLibrary } from "../db/seed-library";
import { buildIsStale, freePort, root, run, startNext, waitFor } from "./lib.mjs";

const STUDY_ID = DEMO_STUDIES.find((s) => s.kitIds.length === 5)?.id ?? DEMO_STUDIES[0].id;
const LIST_PATH = "/api/v1/studies?pageSize=20&sort=name";

function arg(name: string, fallback: number): number {
  const i = process.argv.indexOf(`--${name}`);
  const v = i >= 0 ? Number(process.argv[i + 1]) : NaN;
  return Number.isFinite(v) && v > 0 ? v : fallback;
}

// ── The bare handler (child process) ────────────────────────────────────────────────────────────

async function bareServer(port: number) {
  const { studyResultsBody, listStudies } = await import("../db/studies");
  const owner = DEMO_PEOPLE[0];
  const caller = { userId: owner.id, name: owner.name, email: owner.email, emailVerified: true, units: "mm" as const, shopId: DEMO_SHOP.id, shopName: DEMO_SHOP.name, role: "owner" as const };
  const server = createServer((req, res) => {
    const url = new URL(req.url ?? "/", "http://127.0.0.1");
    const reply = (status: number, body: unknown) => {
      res.writeHead(status, { "content-type": "application/json" });
      res.end(JSON.stringify(body));
    };
    const results = /^\/api\/v1\/studies\/([^/]+)\/results$/.exec(url.pathname);
    const work = results
      ? studyResultsBody(DEMO_SHOP.id, results[1]).then((body) => {
          if (body === null) return reply(404, { error: { code: "not_found", message: "no such study" } });
          res.writeHead(200, { "content-type": "application/json" });
          res.end(body);
        })
      : url.pathname === "/api/v1/studies"
        ? listStudies(caller, { page: 1, pageSize: Number(url.searchParams.get("pageSize") ?? 20), sort: "name", dir: "asc", archived: "0" }).then((p) => reply(200, p))
        : Promise.resolve(reply(404, { error: { code: "not_found", message: "no such route" } }));
    work.catch((e: unknown) => reply(500, { error: { code: "internal", message: String(e) } }));
  });
  server.listen(port, "127.0.0.1", () => console.log("bare handler ready"));
}

// ── The run ──────────────────────────────────────────────────────────────────────────────────────

type Figures = { requestsPerSecond: number; p99Ms: number; p50Ms: number; non2xx: number; errors: number };

async function load(url: string, headers: Record<string, string>, connections: number, seconds: number): Promise<Figures> {
  const r = await autocannon({ url, headers, connections, duration: seconds, pipelining: 1 });
  return { requestsPerSecond: Math.round(r.requests.average), p99Ms: r.latency.p99, p50Ms: r.latency.p50, non2xx: r.non2xx, errors: r.errors + r.timeouts };
}

async function main() {
  const seconds = arg("seconds", 10);
  const connections = arg("connections", 50);
  const children: ChildProcess[] = [];
  const dir = mkdtempSync(join(tmpdir(), "borewright-bench-"));
  const stop = () => {
    for (const c of children) if (c.exitCode === null) c.kill("SIGTERM");
    rmSync(dir, { recursive: true, force: true });
  };
  process.on("SIGINT", () => {
    stop();
    process.exit(130);
  });
  try {
    if (buildIsStale()) run("npx", ["next", "build"]);
    const databaseURL = `file:${join(dir, "bench.db")}`;
    await applyMigrations({ ...process.env, DATABASE_URL: databaseURL });
    const client = createClient({ url: databaseURL });
    const db = drizzle(client, { schema });
    await seedDemo(db);
    await seedLibrary(db, DEMO_SHOP.id, DEMO_PEOPLE[0], DEMO_PEOPLE[1]);
    client.close();

    const port = await freePort();
    const base = `http://127.0.0.1:${port}`;
    const secret = randomBytes(32).toString("base64url");
    const server = startNext({ port, quiet: true, env: { DATABASE_URL: databaseURL, BETTER_AUTH_URL: base, BETTER_AUTH_SECRET: secret, PAYMENTS: "off" } });
    children.push(server);
    await waitFor(`${base}/sign-in`, 60_000);

    const owner = DEMO_PEOPLE[0];
    const signIn = await fetch(`${base}/api/auth/sign-in/email`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: base },
      body: JSON.stringify({ email: owner.email, password: owner.password }),
    });
    if (signIn.status !== 200) throw new Error(`sign-in answered ${signIn.status}`);
    const cookie = signIn.headers.getSetCookie().map((c) => c.split(";")[0]).join("; ");
    const headers = { cookie };
    const check = await fetch(`${base}/api/v1/studies/${STUDY_ID}/results`, { headers });
    if (check.status !== 200) throw new Error(`results answered ${check.status}: ${await check.text()}`);

    const barePort = await freePort();
    const bare = spawn(process.execPath, [...process.execArgv, fileURLToPath(import.meta.url), "--bare", String(barePort)], {
      cwd: root,
      env: { ...process.env, DATABASE_URL: databaseURL, BETTER_AUTH_SECRET: secret, BETTER_AUTH_URL: base, NODE_ENV: "production" },
      stdio: ["ignore", "inherit", "inherit"],
    });
    children.push(bare);
    const bareBase = `http://127.0.0.1:${barePort}`;
    await waitFor(`${bareBase}/`, 30_000);

    // A short warm-up of each, so the first compilations are not measured.
    for (const url of [`${base}/api/v1/studies/${STUDY_ID}/results`, `${base}${LIST_PATH}`, `${bareBase}/api/v1/studies/${STUDY_ID}/results`, `${bareBase}${LIST_PATH}`]) {
      await autocannon({ url, headers, connections: 4, amount: 200 });
    }

    const rows: { name: string; app: Figures; bare: Figures }[] = [];
    for (const [name, path] of [
      [`study results (${connections} connections)`, `/api/v1/studies/${STUDY_ID}/results`],
      [`list studies (${connections} connections)`, LIST_PATH],
    ] as const) {
      const app = await load(`${base}${path}`, headers, connections, seconds);
      const bareFigures = await load(`${bareBase}${path}`, {}, connections, seconds);
      rows.push({ name, app, bare: bareFigures });
    }

    console.log(`\nAPI benchmark: ${seconds} s per run, 127.0.0.1, production build, file database (libSQL)\n`);
    console.log("what".padEnd(34) + "app req/s".padStart(11) + "app p99".padStart(10) + "bare req/s".padStart(12) + "bare p99".padStart(10) + "app/bare".padStart(10));
    let failed = false;
    for (const r of rows) {
      const ratio = r.app.requestsPerSecond / Math.max(1, r.bare.requestsPerSecond);
      console.log(
        r.name.padEnd(34) +
          String(r.app.requestsPerSecond).padStart(11) +
          `${r.app.p99Ms} ms`.padStart(10) +
          String(r.bare.requestsPerSecond).padStart(12) +
          `${r.bare.p99Ms} ms`.padStart(10) +
          `${(ratio * 100).toFixed(0)} %`.padStart(10),
      );
      if (r.app.non2xx || r.app.errors || r.bare.non2xx || r.bare.errors) {
        failed = true;
        console.error(`  ${r.name}: app ${r.app.non2xx} non-2xx, ${r.app.errors} errors; bare ${r.bare.non2xx} non-2xx, ${r.bare.errors} errors`);
      }
    }
    console.log("\nAim: p99 under 50 ms, and at least half the bare handler's requests/s.");
    mkdirSync(join(root, "bench-results"), { recursive: true });
    writeFileSync(join(root, "bench-results", "api.json"), `${JSON.stringify({ at: new Date().toISOString(), seconds, connections, rows }, null, 2)}\n`);
    if (failed) process.exitCode = 1;
  } finally {
    stop();
  }
}

if (process.argv.includes("--bare")) {
  void bareServer(Number(process.argv[process.argv.indexOf("--bare") + 1]));
} else {
  main().catch((e: unknown) => {
    console.error("bench failed:", e instanceof Error ? e.message : e);
    process.exit(1);
  });
}
