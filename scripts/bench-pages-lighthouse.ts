// Lighthouse on one page of the running production build, and the table of its figures. Part of
// `npm run bench:pages`. Mobile simulation (the package's default: a mid-range phone, 4× CPU slow-down, a
// slow 4G link); a page may name its own phone-sized screen.
import { writeFileSync } from "node:fs";
import lighthouse from "lighthouse";

/** A screen for the page (CSS pixels and density); without one, Lighthouse's own mobile screen (412 × 823 at 1.75). */
export type Screen = { width: number; height: number; deviceScaleFactor: number };
export const DEFAULT_SCREEN: Screen = { width: 412, height: 823, deviceScaleFactor: 1.75 };

export type PageFigures = {
  name: string;
  path: string;
  screen: string;
  score: number;
  tbtMs: number;
  lcpMs: number;
  fcpMs: number;
  clsScore: number;
  longestTaskMs: number;
  longestTaskIn: string;
  longTasks: number;
  /** The scripts that cost the main thread most (Lighthouse's bootup-time: evaluation + parse/compile), file and ms. */
  heaviestScripts: { file: string; scriptingMs: number }[];
  unusedJsBytes: number;
  /** Scripts over the wire (compressed), every script of the visit: the first ones and those fetched after. */
  scriptBytes: number;
  /** The same scripts uncompressed: what the phone parses, in the unit of the first-load aim. */
  scriptResourceBytes: number;
  benchmarkIndex: number;
};

type Audit = { numericValue?: number; details?: { items?: Record<string, unknown>[]; overallSavingsBytes?: number } };

/** Lighthouse on one page; with `reportFile`, its whole report (JSON) is written there too. */
export async function lighthousePage(name: string, url: string, port: number, headers: Record<string, string>, screen: Screen = DEFAULT_SCREEN, reportFile?: string): Promise<PageFigures> {
  const result = await lighthouse(url, {
    port,
    output: "json",
    logLevel: "error",
    onlyCategories: ["performance"],
    extraHeaders: headers,
    formFactor: "mobile",
    screenEmulation: { mobile: true, disabled: false, ...screen },
  });
  if (!result) throw new Error(`Lighthouse gave no result for ${url}`);
  const lhr = result.lhr;
  if (lhr.runtimeError) throw new Error(`Lighthouse on ${url}: ${lhr.runtimeError.code} ${lhr.runtimeError.message}`);
  if (reportFile) writeFileSync(reportFile, JSON.stringify(lhr));
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
  const scriptResourceBytes = (audit("network-requests")?.details?.items ?? []).filter((i) => i.resourceType === "Script").reduce((sum, i) => sum + (Number(i.resourceSize) || 0), 0);
  return {
    name,
    path: new URL(url).pathname,
    screen: `${screen.width}×${screen.height}`,
    score: Math.round((lhr.categories.performance.score ?? 0) * 100),
    tbtMs: audit("total-blocking-time")?.numericValue ?? NaN,
    lcpMs: audit("largest-contentful-paint")?.numericValue ?? NaN,
    fcpMs: audit("first-contentful-paint")?.numericValue ?? NaN,
    clsScore: audit("cumulative-layout-shift")?.numericValue ?? NaN,
    longestTaskMs: tasks.length ? Math.max(...tasks) : 0,
    longestTaskIn: longest ? fileOf(longest.url) : "–",
    longTasks: tasks.length,
    heaviestScripts,
    unusedJsBytes: audit("unused-javascript")?.details?.overallSavingsBytes ?? 0,
    scriptBytes: Number(scripts?.transferSize ?? 0),
    scriptResourceBytes,
    benchmarkIndex: lhr.environment.benchmarkIndex,
  };
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor((xs.length - 1) / 2)];

/** The table: one line per page, the median of the runs for each figure. */
export function printFigures(rows: PageFigures[][]) {
  console.log(`\nLighthouse (mobile simulation, performance only): median of ${rows.length} run(s) per page\n`);
  const columns = ["screen", "score", "TBT", "LCP", "FCP", "CLS", "longest task", "tasks>50ms", "unused JS", "JS sent", "JS parsed", "CPU index"];
  console.log("page".padEnd(22) + columns.map((c) => c.padStart(c.length > 9 ? 14 : 11)).join(""));
  for (let p = 0; p < rows[0].length; p++) {
    const of = (key: keyof PageFigures) => median(rows.map((r) => Number(r[p][key])));
    const cells = [
      rows[0][p].screen.padStart(11),
      String(of("score")).padStart(11),
      `${of("tbtMs").toFixed(0)} ms`.padStart(11),
      `${(of("lcpMs") / 1000).toFixed(1)} s`.padStart(11),
      `${(of("fcpMs") / 1000).toFixed(1)} s`.padStart(11),
      of("clsScore").toFixed(3).padStart(11),
      `${of("longestTaskMs").toFixed(0)} ms`.padStart(14),
      String(of("longTasks")).padStart(11),
      `${(of("unusedJsBytes") / 1024).toFixed(0)} KiB`.padStart(11),
      `${(of("scriptBytes") / 1024).toFixed(0)} KiB`.padStart(11),
      `${(of("scriptResourceBytes") / 1000).toFixed(0)} kB`.padStart(11),
      of("benchmarkIndex").toFixed(0).padStart(11),
    ];
    console.log(rows[0][p].name.padEnd(22) + cells.join(""));
  }
  const last = rows[rows.length - 1];
  console.log("\nWhere the main thread goes (last run): the longest task's script, and the three costliest scripts (evaluation + compile)");
  for (const p of last) console.log(`  ${p.name.padEnd(20)} longest task in ${p.longestTaskIn}; ${p.heaviestScripts.map((h) => `${h.file} ${h.scriptingMs} ms`).join(", ")}`);
  console.log("Aim: /try, the study page and the consult page (on a phone's screen) score at least 90, TBT at most 200 ms, no task over 50 ms during load.");
  console.log("JS sent: every script of the visit over the wire (gzip); JS parsed: the same uncompressed.");
  console.log("TBT, LCP and task lengths are Lighthouse's simulation of a mid-range phone (4× CPU slow-down) from what this machine measured: a busy machine inflates them; the framework floor (the root scripts alone) and the sign-in page are the baselines of the same run.");
}
