// Benchmark of the fit studio: opens /try with a study of five kits on a polygon case in headless
// Chromium (WebGL on SwiftShader), steps the cut-diameter slider 100 times and prints the median and
// p95 time from each input to the frame that shows it (performance.measure in the page), then the
// first-load JavaScript of the studio page and of the Library page from the build's manifests.
// The same-run baseline: a bare range input added to the same page, stepped by the same keys between the
// studio's steps, with nothing listening but the clock: the floor of input to the next animation frame on
// this machine at this moment. `-- --trace FILE` also writes a Chromium performance trace of the steps;
// `-- --profile FILE` a CPU profile of them (.cpuprofile, for DevTools) and prints the functions that cost most.
// Needs a production build in NEXT_DIST_DIR (default .next). Usage: npm run bench:studio
import { existsSync, readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { createRequire } from "node:module";
import { gzipSync } from "node:zlib";
import { chromium } from "playwright-core";
import type { StudyInput } from "../geometry";
import { ensureSecrets, freePort, root, startNext, waitFor } from "./lib.mjs";

const dist = process.env.NEXT_DIST_DIR || ".next";
const STEPS = 100;
const traceAt = process.argv.indexOf("--trace");
const traceFile = traceAt > 0 ? process.argv[traceAt + 1] : undefined;
const profileAt = process.argv.indexOf("--profile");
const profileFile = profileAt > 0 ? process.argv[profileAt + 1] : undefined;

declare global {
  interface Window {
    /** The baseline input's steps seen in an animation frame. */
    __floorFrames?: number;
  }
}

/** The example study made harder: a polygon deck and a twelve-sided mouth, five invented kits. */
function benchStudy(): StudyInput {
  const s = JSON.parse(readFileSync(join(root, "public/examples/study.json"), "utf8")) as StudyInput;
  const mouth: [number, number][] = Array.from({ length: 12 }, (_, i) => [24 * Math.cos((i * Math.PI) / 6), 22 * Math.sin((i * Math.PI) / 6)]);
  s.case.mouth = { outline: { kind: "polygon", pointsMm: mouth }, depthMm: 26 };
  const base = s.kits[0];
  s.kits = [47, 48, 49, 50, 52].map((bore, i) => ({
    ...base,
    id: `bench-${bore}`,
    name: `Bench ${bore} mm kit`,
    boreMm: bore,
    skirtDiameterReadingsMm: [bore + 6.9, bore + 6.95],
    skirtLengthReadingsMm: [24.6 + i * 0.4],
  }));
  s.name = "Bench study: five kits on a polygon case";
  return s;
}

const quantile = (xs: number[], q: number) => {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.max(0, Math.ceil(q * s.length) - 1))];
};
const fmt = (xs: number[]) => `median ${quantile(xs, 0.5).toFixed(2)} ms, p95 ${quantile(xs, 0.95).toFixed(2)} ms`;

/** First-load JS of an app route: the root main files plus every entry chunk its client-reference manifest lists. */
function firstLoad(route: string): { files: string[]; bytes: number; gzip: number; hasThree: boolean } | null {
  const file = join(root, dist, "server/app", route, "page_client-reference-manifest.js");
  if (!existsSync(file)) return null;
  const g = globalThis as { __RSC_MANIFEST?: Record<string, { entryJSFiles: Record<string, string[]> }> };
  createRequire(import.meta.url)(file);
  const entry = Object.entries(g.__RSC_MANIFEST ?? {}).find(([k]) => k === `${route.replace(/^\/?/, "/")}/page`)?.[1];
  if (!entry) return null;
  const build = JSON.parse(readFileSync(join(root, dist, "build-manifest.json"), "utf8")) as { rootMainFiles: string[] };
  const files = [...new Set([...build.rootMainFiles, ...Object.values(entry.entryJSFiles).flat()])];
  let bytes = 0, gzip = 0, hasThree = false;
  for (const f of files) {
    const buf = readFileSync(join(root, dist, f));
    bytes += buf.length;
    gzip += gzipSync(buf).length;
    if (buf.includes("WebGLRenderer")) hasThree = true;
  }
  return { files, bytes, gzip, hasThree };
}

interface ProfileNode {
  id: number;
  callFrame: { functionName: string; url: string; lineNumber: number; columnNumber: number };
  children?: number[];
}

/** The 15 functions with the most self time in a CPU profile, with their share of the sampled time that was not idle. */
function printHotFunctions(profile: { nodes: ProfileNode[]; samples?: number[]; timeDeltas?: number[] }) {
  const byId = new Map(profile.nodes.map((n) => [n.id, n]));
  const self = new Map<string, number>();
  let busy = 0;
  (profile.samples ?? []).forEach((id, i) => {
    const f = byId.get(id)?.callFrame;
    const dt = (profile.timeDeltas?.[i] ?? 0) / 1000;
    if (!f || f.functionName === "(idle)" || f.functionName === "(program)") return;
    busy += dt;
    const key = `${f.functionName || "(anonymous)"} ${f.url.split("/").pop()}:${f.lineNumber + 1}:${f.columnNumber + 1}`;
    self.set(key, (self.get(key) ?? 0) + dt);
  });
  console.log(`  CPU profile: ${busy.toFixed(0)} ms busy; most self time:`);
  for (const [key, ms] of [...self].sort((a, b) => b[1] - a[1]).slice(0, 15)) console.log(`    ${ms.toFixed(1).padStart(7)} ms ${((100 * ms) / busy).toFixed(1).padStart(5)} %  ${key}`);
}

async function main() {
  if (!existsSync(join(root, dist, "BUILD_ID"))) throw new Error(`no production build in ${dist}: run NEXT_DIST_DIR=${dist} npx next build first`);
  const port = await freePort();
  const base = `http://127.0.0.1:${port}`;
  // A production server refuses to start without its secrets: the install's own, from .env.local.
  ensureSecrets();
  const server = startNext({ port, quiet: true, env: { BETTER_AUTH_URL: base } });
  const browser = await chromium.launch({
    executablePath: "/usr/bin/chromium",
    args: ["--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync", "--use-angle=swiftshader", "--enable-unsafe-swiftshader"],
  });
  try {
    await waitFor(`${base}/try`, 60_000, server);
    const page = await browser.newPage({ viewport: { width: 1400, height: 1000 } });
    const study = JSON.stringify(benchStudy());
    await page.route("**/examples/study.json", (r) => r.fulfill({ status: 200, contentType: "application/json", body: study }));
    await page.goto(`${base}/try`);
    await page.waitForSelector("[data-testid=view] canvas", { timeout: 60_000 });
    // The canvas carries the key of what its last frame shows; the studio, the key of what it asks for.
    await page.waitForFunction(() => {
      const view = document.querySelector<HTMLElement>("[data-testid=view]");
      return Boolean(view && view.querySelector("canvas")?.dataset.drawn === view.dataset.wanted);
    }, undefined, { timeout: 60_000 });
    const slider = page.getByTestId("cut-diameter");
    const field = page.getByTestId("cut-diameter-field");
    await field.fill("52");
    await field.press("Enter");
    await page.waitForFunction(() => document.querySelector("[data-testid=verdict]")?.getAttribute("data-cut") === "52.00", undefined, { timeout: 30_000 });
    // The baseline: a range input of the same page that only times its input to the next animation frame.
    await page.evaluate(() => {
      const floor = document.createElement("input");
      Object.assign(floor, { type: "range", min: "0", max: "1000", step: "1", value: "0" });
      floor.dataset.testid = "bench-floor";
      floor.setAttribute("aria-label", "benchmark baseline");
      floor.style.cssText = "position:fixed;left:0;bottom:0;width:200px";
      floor.addEventListener("input", (e) => {
        const at = e.timeStamp;
        requestAnimationFrame(() => {
          performance.measure("floor:input-to-animation-frame", { start: at, duration: performance.now() - at });
          window.__floorFrames = (window.__floorFrames ?? 0) + 1;
        });
      });
      document.body.append(floor);
      window.__floorFrames = 0;
      window.__fitFrames = [];
      for (const n of ["studio:input-to-frame", "studio:input-to-animation-frame", "studio:evaluate", "studio:scene-update", "studio:render"]) performance.clearMeasures(n);
    });
    const floor = page.getByTestId("bench-floor");
    if (traceFile) await browser.startTracing(page, { path: traceFile, categories: ["devtools.timeline", "disabled-by-default-devtools.timeline", "blink.user_timing"] });
    const cdp = profileFile ? await page.context().newCDPSession(page) : null;
    if (cdp) {
      await cdp.send("Profiler.enable");
      await cdp.send("Profiler.setSamplingInterval", { interval: 100 });
      await cdp.send("Profiler.start");
    }
    // Studio and baseline steps alternate, so both see the same load.
    for (let i = 1; i <= STEPS; i++) {
      await slider.press("ArrowRight");
      await page.waitForFunction((n) => (window.__fitFrames?.length ?? 0) >= n, i, { timeout: 10_000 });
      await floor.press("ArrowRight");
      await page.waitForFunction((n) => (window.__floorFrames ?? 0) >= n, i, { timeout: 10_000 });
    }
    if (traceFile) await browser.stopTracing();
    if (cdp && profileFile) {
      const { profile } = await cdp.send("Profiler.stop");
      writeFileSync(profileFile, JSON.stringify(profile));
      printHotFunctions(profile);
    }
    const times = await page.evaluate(() => performance.getEntriesByName("studio:input-to-frame").map((e) => e.duration));
    const finalValue = await slider.inputValue();
    console.log(`studio, 5 kits on a polygon case, ${times.length} slider steps (52.00 → ${finalValue} mm):`);
    console.log(`  input to rendered frame: ${fmt(times)}`);
    for (const [label, name] of [["input to the next animation frame (when the compositor can show it)", "studio:input-to-animation-frame"], ["core evaluation (kit on show)", "studio:evaluate"], ["scene update", "studio:scene-update"], ["WebGL render call", "studio:render"]]) {
      const xs = await page.evaluate((n) => performance.getEntriesByName(n).map((e) => e.duration), name);
      if (xs.length) console.log(`  ${label}: ${fmt(xs)} (${xs.length} samples)`);
    }
    const floorTimes = await page.evaluate(() => performance.getEntriesByName("floor:input-to-animation-frame").map((e) => e.duration));
    console.log(`  baseline, a bare range input on the same page, same keys in between: input to the next animation frame ${fmt(floorTimes)}`);
    if (traceFile) console.log(`  trace of the steps written to ${traceFile}`);
  } finally {
    await browser.close();
    server.kill("SIGTERM");
  }
  for (const [name, route] of [["studio (/try)", "try"], ["study page (/studies/[id])", "(shop)/studies/[id]"], ["Library (/library)", "(shop)/library"]] as const) {
    const fl = firstLoad(route);
    if (!fl) console.log(`${name}: no manifest in ${dist}`);
    else console.log(`${name}: first-load JS ${(fl.bytes / 1024).toFixed(0)} kB (${(fl.gzip / 1024).toFixed(0)} kB gzip) in ${fl.files.length} files; three.js in first load: ${fl.hasThree ? "yes" : "no"}`);
  }
}

main().catch((e: unknown) => {
  console.error(e);
  process.exit(1);
});
