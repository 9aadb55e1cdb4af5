// The API benchmark: `npm run bench:api [-- --seconds 10 --connections 50 --no-build --cpu-prof DIR]`.
// Starts the production server on 127.0.0.1 against a fresh seeded file database, signs in, and loads it
// with autocannon for a bounded time: reading a study's results (the five-kit demo study) and listing
// studies. In the same run, two floors answer the same routes:
// - the framework floor: a route handler of the same production server (app/bench-floor) that answers the
//   same JSON text, already held, with no session check and no database. It exists only because the
//   benchmark starts the server with BOREWRIGHT_BENCH_FLOOR naming the file of those texts;
// - the bare floor: a node:http handler (a child process) that reads the same rows through the same data
//   layer and libSQL client, without the framework and the session check.
// Prints requests/s, p50 and p99 of each, and the app's share of each floor. A benchmark, not a test: it
// reports timeouts, refused connections and non-2xx answers as figures, and exits non-zero only when the
// server fails: an answer 5xx, or no answer at all to a single warm-up request. `--cpu-prof DIR` writes the app server's CPU profile there.
//
// Run with tsx's react-server condition (the data layer is server-only):
//   tsx --conditions=react-server scripts/bench-api.ts
import autocannon from "autocannon";
import { spawn, type ChildProcess } from "node:child_process";
import { randomBytes } from "node:crypto";
import { mkdirSync, mkdtempSync, readFileSync, readdirSync, rmSync, writeFileSync } from "node:fs";
import { createServer } from "node:http";
import { cpus, loadavg, tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { DEMO_PEOPLE, DEMO_SHOP, seedBenchDatabase } from "../db/seed";
import { DEMO_STUDIES } from "../db/seed-library";
import { buildIsStale, freePort, root, run, startNext, stopProcesses, waitFor } from "./lib.mjs";

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

type Figures = {
  requestsPerSecond: number;
  p99Ms: number;
  p50Ms: number;
  non2xx: number;
  /** Answers 5xx: the server failed. */
  serverErrors: number;
  /** Requests with no answer within autocannon's timeout (a loaded machine). */
  timeouts: number;
  /** Connection errors other than timeouts. */
  errors: number;
  cpuMsPerRequest: number | null;
};

/**
 * The CPU time a process and its descendants have used, in ms (Linux /proc; null elsewhere). On a shared
 * machine requests/s and latency follow whatever else runs; the server's own CPU time per answered request
 * says what each answer costs the server, though contention inflates it too.
 */
function cpuMs(pid: number | undefined): number | null {
  if (pid === undefined) return null;
  try {
    const tick = 1000 / 100; // USER_HZ is 100 on Linux
    const fields = readFileSync(`/proc/${pid}/stat`, "utf8").split(") ")[1].split(" ");
    let total = (Number(fields[11]) + Number(fields[12])) * tick;
    for (const task of readdirSync(`/proc/${pid}/task`)) {
      for (const child of readFileSync(`/proc/${pid}/task/${task}/children`, "utf8").trim().split(/\s+/).filter(Boolean)) total += cpuMs(Number(child)) ?? 0;
    }
    return total;
  } catch (error) {
    // Without /proc, or once the process has ended, there is no CPU figure: the bench prints "–" for it.
    if ((error as NodeJS.ErrnoException).code) return null;
    throw error;
  }
}

async function load(url: string, headers: Record<string, string>, connections: number, seconds: number, pid: number | undefined): Promise<Figures> {
  const before = cpuMs(pid);
  const r = await autocannon({ url, headers, connections, duration: seconds, pipelining: 1 });
  const after = cpuMs(pid);
  const answered = r.requests.total;
  return {
    requestsPerSecond: Math.round(r.requests.average),
    p99Ms: r.latency.p99,
    p50Ms: r.latency.p50,
    non2xx: r.non2xx,
    serverErrors: r["5xx"],
    timeouts: r.timeouts,
    errors: Math.max(0, r.errors - r.timeouts),
    cpuMsPerRequest: before !== null && after !== null && answered > 0 ? (after - before) / answered : null,
  };
}

function textArg(name: string): string | null {
  const i = process.argv.indexOf(`--${name}`);
  return i >= 0 && process.argv[i + 1] && !process.argv[i + 1].startsWith("--") ? process.argv[i + 1] : null;
}

/** The tail of a quiet server's output, to read beside a failure. */
function serverLog(server: ChildProcess): string {
  const log = (server as ChildProcess & { log?: () => string }).log?.();
  return log ? `\nThe server said:\n${log.slice(-4000)}` : "";
}

const percent = (part: number, whole: number) => `${((part / Math.max(1, whole)) * 100).toFixed(0)} %`;

/** The measured routes, each with the framework floor's route that answers the same text. */
const ROUTES = [
  { name: "study results", path: `/api/v1/studies/${STUDY_ID}/results`, floor: "/bench-floor/results" },
  { name: "list studies", path: LIST_PATH, floor: "/bench-floor/list" },
] as const;
type Route = (typeof ROUTES)[number];
/** The floor's name of a route's text in the floor file ("results", "list"). */
const floorKey = (r: Route) => r.floor.split("/").pop() as string;

type Row = { name: string; bytes: number; app: Figures; floor: Figures; bare: Figures };

/** One run's seeded database, auth secret and floor file (in its own folder), and the app server's address. */
type BenchRun = { databaseURL: string; secret: string; floorFile: string; base: string };

/** Starts the production server (with the CPU profiler when `profileDir` is named) against a freshly seeded database in the run's folder. */
async function startApp(dir: string, profileDir: string | null): Promise<{ bench: BenchRun; server: ChildProcess }> {
  const databaseURL = `file:${join(dir, "bench.db")}`;
  await seedBenchDatabase(databaseURL);
  const port = await freePort();
  const base = `http://127.0.0.1:${port}`;
  const bench: BenchRun = { databaseURL, secret: randomBytes(32).toString("base64url"), floorFile: join(dir, "floor.json"), base };
  const env = { DATABASE_URL: databaseURL, BETTER_AUTH_URL: base, BETTER_AUTH_SECRET: bench.secret, PAYMENTS: "off", BOREWRIGHT_BENCH_FLOOR: bench.floorFile };
  // Node refuses --cpu-prof in NODE_OPTIONS: a profiled server is started here with it on the command line.
  const server = profileDir
    ? spawn(process.execPath, ["--cpu-prof", `--cpu-prof-dir=${profileDir}`, "node_modules/next/dist/bin/next", "start", "-p", String(port), "-H", "127.0.0.1"], {
        cwd: root,
        env: { ...process.env, NEXT_TELEMETRY_DISABLED: "1", NODE_ENV: "production", ...env },
        stdio: ["ignore", "ignore", "inherit"],
      })
    : startNext({ port, quiet: true, env });
  return { bench, server };
}

/** Signs the demo shop's owner in: the session cookie every measured request sends. */
async function ownerHeaders(base: string): Promise<Record<string, string>> {
  const owner = DEMO_PEOPLE[0];
  const signIn = await fetch(`${base}/api/auth/sign-in/email`, {
    method: "POST",
    headers: { "content-type": "application/json", origin: base },
    body: JSON.stringify({ email: owner.email, password: owner.password }),
  });
  if (signIn.status !== 200) throw new Error(`sign-in answered ${signIn.status}`);
  return { cookie: signIn.headers.getSetCookie().map((c) => c.split(";")[0]).join("; ") };
}

/** Writes the texts the measured routes answer now into the floor file, for the framework floor to answer; answers them by floor name. */
async function recordFloorTexts(bench: BenchRun, headers: Record<string, string>, server: ChildProcess): Promise<Record<string, string>> {
  const texts: Record<string, string> = {};
  for (const r of ROUTES) {
    const res = await fetch(`${bench.base}${r.path}`, { headers });
    if (res.status !== 200) throw new Error(`${r.path} answered ${res.status}: ${await res.text()}${serverLog(server)}`);
    texts[floorKey(r)] = await res.text();
  }
  writeFileSync(bench.floorFile, JSON.stringify(texts));
  return texts;
}

/** Starts the bare handler (this script with --bare, a child process) on the run's database; answers it and its address. */
async function startBare(bench: BenchRun): Promise<{ bare: ChildProcess; bareBase: string }> {
  const barePort = await freePort();
  const bare = spawn(process.execPath, [...process.execArgv, fileURLToPath(import.meta.url), "--bare", String(barePort)], {
    cwd: root,
    env: { ...process.env, DATABASE_URL: bench.databaseURL, BETTER_AUTH_SECRET: bench.secret, BETTER_AUTH_URL: bench.base, NODE_ENV: "production" },
    stdio: ["ignore", "inherit", "inherit"],
  });
  return { bare, bareBase: `http://127.0.0.1:${barePort}` };
}

/** Each route's three addresses: the app's, the framework floor's and the bare handler's. */
const addresses = (r: Route, base: string, bareBase: string) => [`${base}${r.path}`, `${base}${r.floor}`, `${bareBase}${r.path}`];

/**
 * One request to each address must be answered, and not with a 5xx; then a short warm-up of each, so the
 * first compilations are not measured.
 */
async function warmUp(base: string, bareBase: string, headers: Record<string, string>): Promise<void> {
  for (const r of ROUTES) {
    for (const url of addresses(r, base, bareBase)) {
      const res = await fetch(url, { headers, signal: AbortSignal.timeout(60_000) }).catch((e: unknown) => {
        throw new Error(`${url} did not answer a single warm-up request: ${e instanceof Error ? e.message : String(e)}`);
      });
      if (res.status >= 500) throw new Error(`${url} answered a warm-up request with ${res.status}: ${await res.text()}`);
      await res.arrayBuffer();
    }
  }
  for (const r of ROUTES) for (const url of addresses(r, base, bareBase)) await autocannon({ url, headers, connections: 4, amount: 200 });
}

/** Prints the table of requests/s and latency, and of server CPU time per answer; answers whether any answer was a 5xx. */
function printRows(rows: Row[], seconds: number, connections: number): boolean {
  console.log(`\nAPI benchmark: ${seconds} s per run, ${connections} connections, 127.0.0.1, production build, file database (libSQL)\n`);
  const columns = ["app req/s", "p50", "p99", "floor req/s", "p50", "p99", "bare req/s", "p50", "p99", "app/floor", "app/bare"];
  console.log("what".padEnd(16) + columns.map((c) => c.padStart(c.includes("req/s") ? 12 : 10)).join(""));
  let failed = false;
  for (const r of rows) {
    const cells = [r.app, r.floor, r.bare].flatMap((f) => [String(f.requestsPerSecond).padStart(12), `${f.p50Ms} ms`.padStart(10), `${f.p99Ms} ms`.padStart(10)]);
    console.log(r.name.padEnd(16) + cells.join("") + percent(r.app.requestsPerSecond, r.floor.requestsPerSecond).padStart(10) + percent(r.app.requestsPerSecond, r.bare.requestsPerSecond).padStart(10));
    for (const [what, f] of [["app", r.app], ["floor", r.floor], ["bare", r.bare]] as const) {
      if (f.serverErrors) failed = true;
      if (f.non2xx || f.timeouts || f.errors) {
        console.log(`  ${r.name}, ${what}: ${f.non2xx} non-2xx (${f.serverErrors} 5xx), ${f.timeouts} timeouts, ${f.errors} connection errors`);
      }
    }
  }
  const cpu = (f: Figures) => (f.cpuMsPerRequest === null ? "–" : `${f.cpuMsPerRequest.toFixed(2)} ms`);
  console.log(`\nServer CPU time per answered request (what each answer costs the server itself):`);
  console.log("what".padEnd(16) + ["app", "floor", "bare", "app/floor", "app/bare"].map((c) => c.padStart(11)).join(""));
  for (const r of rows) {
    const share = (a: Figures, b: Figures) => (a.cpuMsPerRequest && b.cpuMsPerRequest ? percent(b.cpuMsPerRequest, a.cpuMsPerRequest) : "–");
    console.log(r.name.padEnd(16) + [cpu(r.app), cpu(r.floor), cpu(r.bare), share(r.app, r.floor), share(r.app, r.bare)].map((c) => c.padStart(11)).join(""));
  }
  console.log(`Load average at the end: ${loadavg().map((l) => l.toFixed(1)).join(", ")} on ${cpus().length} cores.`);
  console.log(`\nAnswer sizes: ${rows.map((r) => `${r.name.split(" (")[0]} ${r.bytes} bytes`).join(", ")}.`);
  console.log("Aim: at least 80 % of the framework floor for both routes (app/floor: requests/s, and the floor's CPU time over the app's); list studies p99 at most 100 ms.");
  return failed;
}

async function main() {
  const seconds = arg("seconds", 10);
  const connections = arg("connections", 50);
  const children: ChildProcess[] = [];
  const dir = mkdtempSync(join(tmpdir(), "borewright-bench-"));
  const stop = async () => {
    await stopProcesses(children);
    rmSync(dir, { recursive: true, force: true });
  };
  process.on("SIGINT", () => {
    void stop().then(() => process.exit(130));
  });
  try {
    if (!process.argv.includes("--no-build") && buildIsStale()) run("npx", ["next", "build"]);
    const { bench, server } = await startApp(dir, textArg("cpu-prof"));
    children.push(server);
    await waitFor(`${bench.base}/sign-in`, 60_000, server);
    const headers = await ownerHeaders(bench.base);
    const texts = await recordFloorTexts(bench, headers, server);
    const { bare, bareBase } = await startBare(bench);
    children.push(bare);
    await waitFor(`${bareBase}/`, 30_000, bare);
    await warmUp(bench.base, bareBase, headers);

    const rows: Row[] = [];
    for (const r of ROUTES) {
      const app = await load(`${bench.base}${r.path}`, headers, connections, seconds, server.pid);
      const floor = await load(`${bench.base}${r.floor}`, headers, connections, seconds, server.pid);
      const bareFigures = await load(`${bareBase}${r.path}`, {}, connections, seconds, bare.pid);
      rows.push({ name: r.name, bytes: Buffer.byteLength(texts[floorKey(r)]), app, floor, bare: bareFigures });
    }
    const failed = printRows(rows, seconds, connections);
    mkdirSync(join(root, "bench-results"), { recursive: true });
    writeFileSync(join(root, "bench-results", "api.json"), `${JSON.stringify({ at: new Date().toISOString(), seconds, connections, rows }, null, 2)}\n`);
    if (failed) {
      console.error("The server answered 5xx under load: see the figures above.");
      process.exitCode = 1;
    }
  } finally {
    await stop();
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
