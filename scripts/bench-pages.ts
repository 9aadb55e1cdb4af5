// The page-load benchmark: `npm run bench:pages [-- --no-build --sizes-only --runs N]`.
// 1. First-load JavaScript of each page, read from the production build's manifests: the framework's root
//    scripts plus the page's own entry chunks (the code a first visit must download and parse before the page
//    can answer), uncompressed and gzip; and whether any of them holds three.js, the core's polygon code or the
//    PDF writer.
// 2. Lighthouse (mobile simulation, the package's default) on the production build it starts on 127.0.0.1
//    against a fresh seeded file database: the sign-in page (a light static page of the same server, the
//    baseline of the same run), /try and the five-kit demo study (signed in as the demo owner). Prints the
//    performance score, total blocking time, largest contentful paint, the longest main-thread task, the
//    count of tasks over 50 ms and the JavaScript loaded but never used.
// A benchmark, not a test: it reports, and fails only when the server or a page does. On a busy machine
// every Lighthouse figure is worse; compare pages with the baseline of the same run, and read the load
// average and Lighthouse's own CPU benchmark index printed beside them.
//
// Run with tsx's react-server condition (the seed uses the server-only data layer):
//   tsx --conditions=react-server scripts/bench-pages.ts
import { createClient } from "@libsql/client";
import * as chromeLauncher from "chrome-launcher";
import { drizzle } from "drizzle-orm/libsql";
import lighthouse from "lighthouse";
import type { ChildProcess } from "node:child_process";
import { randomBytes } from "node:crypto";
import { existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync, statSync, writeFileSync } from "node:fs";
import { cpus, loadavg, tmpdir } from "node:os";
import { join } from "node:path";
import { gzipSync } from "node:zlib";
import { applyMigrations } from "../db/migrate";
import * as schema from "../db/schema";
import { DEMO_PEOPLE, DEMO_SHOP, seedDemo } from "../db/seed";
import { DEMO_STUDIES, seedLibrary } from "../db/seed-library";
import { buildIsStale, freePort, root, run, startNext, stopProcesses, waitFor } from "./lib.mjs";

const STUDY_ID = DEMO_STUDIES.find((s) => s.kitIds.length === 5)?.id ?? DEMO_STUDIES[0].id;
const DIST = process.env.NEXT_DIST_DIR || ".next";
const CHROMIUM = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";

/** Pages whose first-load JavaScript is printed, by their route in the build; the light ones have an aim. */
const SIZED_PAGES: { route: string; light: boolean }[] = [
  { route: "/(auth)/sign-in", light: true },
  { route: "/(shop)/home", light: true },
  { route: "/(shop)/library", light: true },
  { route: "/(shop)/jobs", light: true },
  { route: "/(shop)/settings", light: true },
  { route: "/(shop)/studies", light: true },
  { route: "/(shop)/library/[kind]/[id]", light: false },
  { route: "/(shop)/jobs/[id]", light: false },
  { route: "/(shop)/consult/[id]", light: false },
  { route: "/try", light: false },
  { route: "/(shop)/studies/[id]", light: false },
];
const LIGHT_PAGE_AIM_BYTES = 300_000;

/** Text that marks a chunk as holding heavy code no light page should carry. */
const HEAVY_MARKS: { name: string; test: (code: string) => boolean }[] = [
  { name: "three.js", test: (c) => c.includes("WebGLRenderer") || c.includes("THREE.WebGLRenderer") },
  { name: "react-three-fiber", test: (c) => c.includes("R3F: Hooks can only be used within the Canvas component") },
  { name: "polygon booleans", test: (c) => c.includes("polygon-clipping") || c.includes("SweepEvent") || c.includes("Flatten.Polygon") },
  { name: "PDF writer", test: (c) => c.includes("PDFDocument") || c.includes("pdfkit") },
  // The core's fit evaluation (geometry/), known by one of its error texts (its own code is minified).
  { name: "fit evaluation", test: (c) => c.includes("the depth-stop search lost the stack") },
  // Not heavy, but worth knowing: the core's input schemas (zod) on a page.
  { name: "(core schemas)", test: (c) => c.includes("chamfered-rect") },
];

function flag(name: string): boolean {
  return process.argv.includes(`--${name}`);
}

function numberArg(name: string, fallback: number): number {
  const i = process.argv.indexOf(`--${name}`);
  const v = i >= 0 ? Number(process.argv[i + 1]) : NaN;
  return Number.isFinite(v) && v > 0 ? v : fallback;
}

const kB = (bytes: number) => `${(bytes / 1000).toFixed(0)} kB`;

// ── First-load JavaScript from the build's manifests ────────────────────────────────────────────

type PageSize = { route: string; light: boolean; files: number; bytes: number; gzipBytes: number; ownBytes: number; heavy: string[] };

/**
 * The entry scripts of one app route, from the client reference manifest the build writes beside the
 * route's server code: the JavaScript files every client component of the page (and its layouts) loads
 * first, with the build's root scripts (the framework and the router) in front.
 */
function routeEntryFiles(distDir: string, route: string): string[] | null {
  const file = join(distDir, "server", "app", route, "page_client-reference-manifest.js");
  if (!existsSync(file)) return null;
  const text = readFileSync(file, "utf8");
  // The file is `globalThis.__RSC_MANIFEST["/route/page"] = {…};`: the JSON after the last assignment.
  const start = text.indexOf("{", text.lastIndexOf("] = "));
  const manifest = JSON.parse(text.slice(start, text.lastIndexOf("}") + 1)) as { entryJSFiles?: Record<string, string[]> };
  const files = new Set<string>();
  for (const list of Object.values(manifest.entryJSFiles ?? {})) for (const f of list) files.add(f);
  return [...files];
}

function rootFiles(distDir: string): string[] {
  const manifest = JSON.parse(readFileSync(join(distDir, "build-manifest.json"), "utf8")) as { rootMainFiles?: string[]; polyfillFiles?: string[] };
  // The polyfills load only in browsers without modules (nomodule): not first-load code of today's browsers.
  return manifest.rootMainFiles ?? [];
}

function measurePages(distDir: string): { sizes: PageSize[]; rootBytes: number } {
  const base = rootFiles(distDir);
  const sizes: PageSize[] = [];
  let rootBytes = 0;
  const cache = new Map<string, { bytes: number; gzipBytes: number; heavy: string[] }>();
  const chunk = (f: string) => {
    let c = cache.get(f);
    if (!c) {
      const path = join(distDir, f.replace(/^\/?_next\//, ""));
      const code = readFileSync(path);
      const text = code.toString("utf8");
      c = { bytes: statSync(path).size, gzipBytes: gzipSync(code).length, heavy: HEAVY_MARKS.filter((m) => m.test(text)).map((m) => m.name) };
      cache.set(f, c);
    }
    return c;
  };
  for (const f of base.filter((f) => f.endsWith(".js"))) rootBytes += chunk(f).bytes;
  for (const page of SIZED_PAGES) {
    const own = routeEntryFiles(distDir, page.route);
    if (own === null) continue;
    const files = [...new Set([...base, ...own])].filter((f) => f.endsWith(".js"));
    let bytes = 0;
    let gzipBytes = 0;
    const heavy = new Set<string>();
    for (const f of files) {
      const c = chunk(f);
      bytes += c.bytes;
      gzipBytes += c.gzipBytes;
      for (const h of c.heavy) heavy.add(h);
    }
    sizes.push({ route: page.route, light: page.light, files: files.length, bytes, gzipBytes, ownBytes: bytes - rootBytes, heavy: [...heavy] });
  }
  return { sizes, rootBytes };
}

function printSizes(sizes: PageSize[], rootBytes: number) {
  console.log(`\nFirst-load JavaScript per page (from ${DIST}/ manifests: root scripts + the page's entry chunks)\n`);
  console.log("page".padEnd(30) + "files".padStart(7) + "bytes".padStart(10) + "gzip".padStart(10) + "beyond root".padStart(13) + "   heavy code in it");
  for (const s of sizes) {
    const over = s.light && s.bytes > LIGHT_PAGE_AIM_BYTES ? "  (over the 300 kB aim)" : "";
    console.log(s.route.padEnd(30) + String(s.files).padStart(7) + kB(s.bytes).padStart(10) + kB(s.gzipBytes).padStart(10) + kB(s.ownBytes).padStart(13) + `   ${s.heavy.join(", ") || "none"}${over}`);
  }
  console.log(`The build's root scripts (React DOM, the router, the bundler's runtime), on every page: ${kB(rootBytes)}.`);
  console.log("Aim: pages without 3D (sign-in, home, library, jobs, settings, studies list) at most 300 kB uncompressed, none of three.js, the polygon booleans, the fit evaluation or the PDF writer.");
}

// ── Lighthouse ───────────────────────────────────────────────────────────────────────────────────

type PageFigures = {
  name: string;
  path: string;
  score: number;
  tbtMs: number;
  lcpMs: number;
  fcpMs: number;
  longestTaskMs: number;
  longestTaskIn: string;
  longTasks: number;
  /** The scripts that cost the main thread most (Lighthouse's bootup-time: evaluation + parse/compile), file and ms. */
  heaviestScripts: { file: string; scriptingMs: number }[];
  unusedJsBytes: number;
  scriptBytes: number;
  benchmarkIndex: number;
};

type Audit = { numericValue?: number; details?: { items?: Record<string, unknown>[]; overallSavingsBytes?: number } };

async function lighthousePage(name: string, url: string, port: number, headers: Record<string, string>): Promise<PageFigures> {
  const result = await lighthouse(url, { port, output: "json", logLevel: "error", onlyCategories: ["performance"], extraHeaders: headers });
  if (!result) throw new Error(`Lighthouse gave no result for ${url}`);
  const lhr = result.lhr;
  if (lhr.runtimeError) throw new Error(`Lighthouse on ${url}: ${lhr.runtimeError.code} ${lhr.runtimeError.message}`);
  const final = new URL(lhr.finalDisplayedUrl);
  if (final.pathname !== new URL(url).pathname) throw new Error(`${url} ended at ${final.pathname} (not signed in?)`);
  const audit = (id: string) => lhr.audits[id] as Audit | undefined;
  const taskItems = audit("long-tasks")?.details?.items ?? [];
  const tasks = taskItems.map((i) => Number(i.duration) || 0);
  const fileOf = (u: unknown) => String(u ?? "").split("/").pop() || String(u ?? "");
  const longest = taskItems.reduce<Record<string, unknown> | null>((a, i) => (a === null || Number(i.duration) > Number(a.duration) ? i : a), null);
  const heaviestScripts = (audit("bootup-time")?.details?.items ?? [])
    .map((i) => ({ file: fileOf(i.url), scriptingMs: Math.round(Number(i.scripting) + Number(i.scriptParseCompile)) }))
    .sort((a, b) => b.scriptingMs - a.scriptingMs)
    .slice(0, 3);
  const scripts = (audit("resource-summary")?.details?.items ?? []).find((i) => i.resourceType === "script");
  return {
    name,
    path: new URL(url).pathname,
    score: Math.round((lhr.categories.performance.score ?? 0) * 100),
    tbtMs: audit("total-blocking-time")?.numericValue ?? NaN,
    lcpMs: audit("largest-contentful-paint")?.numericValue ?? NaN,
    fcpMs: audit("first-contentful-paint")?.numericValue ?? NaN,
    longestTaskMs: tasks.length ? Math.max(...tasks) : 0,
    longestTaskIn: longest ? fileOf(longest.url) : "–",
    longTasks: tasks.length,
    heaviestScripts,
    unusedJsBytes: audit("unused-javascript")?.details?.overallSavingsBytes ?? 0,
    scriptBytes: Number(scripts?.transferSize ?? 0),
    benchmarkIndex: lhr.environment.benchmarkIndex,
  };
}

function printFigures(rows: PageFigures[][]) {
  console.log(`\nLighthouse ${"(mobile simulation, performance only)"}: median of ${rows.length} run(s) per page\n`);
  const columns = ["score", "TBT", "LCP", "FCP", "longest task", "tasks>50ms", "unused JS", "JS sent", "CPU index"];
  console.log("page".padEnd(22) + columns.map((c) => c.padStart(c.length > 9 ? 14 : 11)).join(""));
  const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor((xs.length - 1) / 2)];
  for (let p = 0; p < rows[0].length; p++) {
    const of = (key: keyof PageFigures) => median(rows.map((r) => Number(r[p][key])));
    const cells = [
      String(of("score")).padStart(11),
      `${of("tbtMs").toFixed(0)} ms`.padStart(11),
      `${(of("lcpMs") / 1000).toFixed(1)} s`.padStart(11),
      `${(of("fcpMs") / 1000).toFixed(1)} s`.padStart(11),
      `${of("longestTaskMs").toFixed(0)} ms`.padStart(14),
      String(of("longTasks")).padStart(11),
      `${(of("unusedJsBytes") / 1024).toFixed(0)} KiB`.padStart(11),
      `${(of("scriptBytes") / 1024).toFixed(0)} KiB`.padStart(11),
      of("benchmarkIndex").toFixed(0).padStart(11),
    ];
    console.log(rows[0][p].name.padEnd(22) + cells.join(""));
  }
  const last = rows[rows.length - 1];
  console.log("\nWhere the main thread goes (last run): the longest task's script, and the three costliest scripts (evaluation + compile)");
  for (const p of last) console.log(`  ${p.name.padEnd(20)} longest task in ${p.longestTaskIn}; ${p.heaviestScripts.map((h) => `${h.file} ${h.scriptingMs} ms`).join(", ")}`);
  console.log("Aim: /try and the study page score at least 90, TBT at most 200 ms, no task over 50 ms during load.");
  console.log("TBT, LCP and task lengths are Lighthouse's simulation of a mid-range phone (4× CPU slow-down) from what this machine measured: a busy machine inflates them; the sign-in row is the baseline.");
}

// ── The run ──────────────────────────────────────────────────────────────────────────────────────

async function main() {
  const runs = numberArg("runs", 1);
  if (!flag("no-build") && buildIsStale()) run("npx", ["next", "build"]);
  const distDir = join(root, DIST);
  const { sizes, rootBytes } = measurePages(distDir);
  printSizes(sizes, rootBytes);
  const out: Record<string, unknown> = { at: new Date().toISOString(), distDir: DIST, rootBytes, sizes };
  const save = () => {
    mkdirSync(join(root, "bench-results"), { recursive: true });
    writeFileSync(join(root, "bench-results", "pages.json"), `${JSON.stringify(out, null, 2)}\n`);
  };
  if (flag("sizes-only")) {
    save();
    return;
  }

  const children: ChildProcess[] = [];
  const dir = mkdtempSync(join(tmpdir(), "borewright-pages-"));
  let chrome: chromeLauncher.LaunchedChrome | null = null;
  const stop = async () => {
    if (chrome) await chrome.kill();
    await stopProcesses(children);
    rmSync(dir, { recursive: true, force: true });
  };
  process.on("SIGINT", () => {
    void stop().then(() => process.exit(130));
  });
  try {
    const databaseURL = `file:${join(dir, "pages.db")}`;
    await applyMigrations({ ...process.env, DATABASE_URL: databaseURL });
    const client = createClient({ url: databaseURL });
    await seedDemo(drizzle(client, { schema }));
    await seedLibrary(drizzle(client, { schema }), DEMO_SHOP.id, DEMO_PEOPLE[0], DEMO_PEOPLE[1]);
    client.close();

    const port = await freePort();
    const base = `http://127.0.0.1:${port}`;
    const env = { DATABASE_URL: databaseURL, BETTER_AUTH_URL: base, BETTER_AUTH_SECRET: randomBytes(32).toString("base64url"), PAYMENTS: "off" };
    const server = startNext({ port, quiet: true, env });
    children.push(server);
    await waitFor(`${base}/sign-in`, 60_000, server);

    const owner = DEMO_PEOPLE[0];
    const signIn = await fetch(`${base}/api/auth/sign-in/email`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: base },
      body: JSON.stringify({ email: owner.email, password: owner.password }),
    });
    if (signIn.status !== 200) throw new Error(`sign-in answered ${signIn.status}`);
    const cookie = signIn.headers.getSetCookie().map((c) => c.split(";")[0]).join("; ");

    mkdirSync(join(dir, "chromium"));
    chrome = await chromeLauncher.launch({
      chromePath: CHROMIUM,
      userDataDir: join(dir, "chromium"),
      chromeFlags: ["--headless=new", "--no-sandbox", "--disable-gpu", "--use-angle=swiftshader", "--enable-unsafe-swiftshader", "--disable-quic"],
    });
    const pages: { name: string; path: string; headers: Record<string, string> }[] = [
      { name: "sign-in (baseline)", path: "/sign-in", headers: {} },
      { name: "/try", path: "/try", headers: {} },
      { name: "study (5 kits)", path: `/studies/${STUDY_ID}`, headers: { cookie } },
    ];
    // One unmeasured visit of each, so the server's first compilation of a route is not measured.
    for (const p of pages) await fetch(`${base}${p.path}`, { headers: p.headers });

    const rows: PageFigures[][] = [];
    for (let r = 0; r < runs; r++) {
      const row: PageFigures[] = [];
      for (const p of pages) row.push(await lighthousePage(p.name, `${base}${p.path}`, chrome.port, p.headers));
      rows.push(row);
    }
    printFigures(rows);
    const load = loadavg();
    console.log(`Load average at the end: ${load.map((l) => l.toFixed(1)).join(", ")} on ${cpus().length} cores.`);
    out.lighthouse = rows;
    out.loadAverage = load;
    save();
  } finally {
    await stop();
  }
}

main().catch((e: unknown) => {
  console.error("bench failed:", e instanceof Error ? e.message : e);
  process.exit(1);
});
