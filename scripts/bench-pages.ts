// The page-load benchmark: `npm run bench:pages [-- --no-build --sizes-only --runs N --pages try,study --reports]`.
// 1. First-load JavaScript of each page, read from the production build's manifests (bench-pages-sizes.ts).
// 2. Lighthouse (mobile simulation, bench-pages-lighthouse.ts) on the production build it starts on 127.0.0.1
//    against a fresh seeded file database: the framework's floor (a page with no script of its own,
//    app/bench-floor/page.tsx), the sign-in page (a light static page of the same server, the baseline of the
//    same run), /try, the five-kit demo study (signed in as the demo owner) and the consult
//    page of the customer's shared plan (signed in as the demo customer, on a phone's screen). Prints the
//    performance score, total blocking time, largest contentful paint, layout shift, the longest main-thread
//    task, the count of tasks over 50 ms and the JavaScript loaded but never used.
// `--pages` measures only the named pages (floor, sign-in, try, study, consult; the floor always, as the baseline
// of the run); `--reports` keeps each page's whole Lighthouse report of the last run in bench-results/lighthouse/.
// A benchmark, not a test: it reports, and fails only when the server or a page does. On a busy machine
// every Lighthouse figure is worse; compare pages with the baseline of the same run, and read the load
// average and Lighthouse's own CPU benchmark index printed beside them.
//
// Run with tsx's react-server condition (the seed uses the server-only data layer):
//   tsx --conditions=react-server scripts/bench-pages.ts
import { createClient } from "@libsql/client";
import * as chromeLauncher from "chrome-launcher";
import { drizzle } from "drizzle-orm/libsql";
import type { ChildProcess } from "node:child_process";
import { randomBytes } from "node:crypto";
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { cpus, loadavg, tmpdir } from "node:os";
import { join } from "node:path";
import { applyMigrations } from "../db/migrate";
import * as schema from "../db/schema";
import { DEMO_PEOPLE, seedEverything } from "../db/seed";
import { DEMO_STUDIES } from "../db/seed-library";
import { lighthousePage, printFigures, type PageFigures, type Screen } from "./bench-pages-lighthouse";
import { measurePages, printSizes } from "./bench-pages-sizes";
import { buildIsStale, freePort, root, run, startNext, stopProcesses, waitFor } from "./lib.mjs";

const STUDY_ID = DEMO_STUDIES.find((s) => s.kitIds.length === 5)?.id ?? DEMO_STUDIES[0].id;
/** The demo customer's job whose plan the shop has shared and which waits for the customer's approval. */
const CONSULT_JOB_ID = "demo-job-planned";
/** A phone held upright (CSS pixels, density 3), for the page a customer opens on their own phone. */
const PHONE: Screen = { width: 390, height: 844, deviceScaleFactor: 3 };
const DIST = process.env.NEXT_DIST_DIR || ".next";
const CHROMIUM = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";

function flag(name: string): boolean {
  return process.argv.includes(`--${name}`);
}

function textArg(name: string): string | null {
  const i = process.argv.indexOf(`--${name}`);
  return i >= 0 ? (process.argv[i + 1] ?? null) : null;
}

function numberArg(name: string, fallback: number): number {
  const i = process.argv.indexOf(`--${name}`);
  const v = i >= 0 ? Number(process.argv[i + 1]) : NaN;
  return Number.isFinite(v) && v > 0 ? v : fallback;
}

/** Signs one demo person in through the auth API and returns the session cookie. */
async function signIn(base: string, person: { email: string; password: string }): Promise<string> {
  const res = await fetch(`${base}/api/auth/sign-in/email`, {
    method: "POST",
    headers: { "content-type": "application/json", origin: base },
    body: JSON.stringify({ email: person.email, password: person.password }),
  });
  if (res.status !== 200) throw new Error(`sign-in of ${person.email} answered ${res.status}`);
  return res.headers.getSetCookie().map((c) => c.split(";")[0]).join("; ");
}

async function main() {
  const runs = numberArg("runs", 1);
  if (!flag("no-build") && buildIsStale()) run("npx", ["next", "build"]);
  const distDir = join(root, DIST);
  const { sizes, rootBytes } = measurePages(distDir);
  printSizes(sizes, rootBytes, DIST);
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
    await seedEverything(drizzle(client, { schema }));
    client.close();

    const port = await freePort();
    const base = `http://127.0.0.1:${port}`;
    // BOREWRIGHT_BENCH_PAGE_FLOOR opens the framework's floor page (app/bench-floor/page.tsx), a 404 otherwise.
    const env = { DATABASE_URL: databaseURL, BETTER_AUTH_URL: base, BETTER_AUTH_SECRET: randomBytes(32).toString("base64url"), PAYMENTS: "off", BOREWRIGHT_BENCH_PAGE_FLOOR: "1" };
    const server = startNext({ port, quiet: true, env });
    children.push(server);
    await waitFor(`${base}/sign-in`, 60_000, server);

    const owner = await signIn(base, DEMO_PEOPLE[0]);
    const customer = await signIn(base, DEMO_PEOPLE[2]);

    mkdirSync(join(dir, "chromium"));
    chrome = await chromeLauncher.launch({
      chromePath: CHROMIUM,
      userDataDir: join(dir, "chromium"),
      chromeFlags: ["--headless=new", "--no-sandbox", "--disable-gpu", "--use-angle=swiftshader", "--enable-unsafe-swiftshader", "--disable-quic"],
    });
    const every: { key: string; name: string; path: string; headers: Record<string, string>; screen?: Screen }[] = [
      { key: "floor", name: "framework floor", path: "/bench-floor", headers: {} },
      { key: "sign-in", name: "sign-in (baseline)", path: "/sign-in", headers: {} },
      { key: "try", name: "/try", path: "/try", headers: {} },
      { key: "study", name: "study (5 kits)", path: `/studies/${STUDY_ID}`, headers: { cookie: owner } },
      { key: "consult", name: "consult (phone)", path: `/consult/${CONSULT_JOB_ID}`, headers: { cookie: customer }, screen: PHONE },
    ];
    const chosen = textArg("pages")?.split(",");
    const unknown = chosen?.filter((k) => !every.some((p) => p.key === k)) ?? [];
    if (unknown.length) throw new Error(`--pages: no page ${unknown.join(", ")} (the pages: ${every.map((p) => p.key).join(", ")})`);
    const pages = every.filter((p) => p.key === "floor" || !chosen || chosen.includes(p.key));
    const reports = flag("reports") ? join(root, "bench-results", "lighthouse") : null;
    if (reports) mkdirSync(reports, { recursive: true });
    // One unmeasured visit of each, so the server's first compilation of a route is not measured.
    for (const p of pages) await fetch(`${base}${p.path}`, { headers: p.headers });

    const rows: PageFigures[][] = [];
    for (let r = 0; r < runs; r++) {
      const row: PageFigures[] = [];
      for (const p of pages) row.push(await lighthousePage(p.name, `${base}${p.path}`, chrome.port, p.headers, p.screen, reports ? join(reports, `${p.key}.json`) : undefined));
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
