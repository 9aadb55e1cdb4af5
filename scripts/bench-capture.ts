// Benchmark of the case-profile form's live plan: opens a case with a 200-corner deck (and two passages)
// in headless Chromium, tries it against two kits of the library, drags one deck corner in 100 pointer
// steps and prints the median and p95 time from each pointer move to the DOM showing it and to the next
// animation frame. In the same run, as baselines: the same drag without the live result, a bare element
// dragged over on the same page (the browser's own floor), and the same corner moved through its x field
// with the plan hidden (the form alone). A benchmark, not a test: it
// prints figures and fails only when a step does not show.
// Needs a production build in NEXT_DIST_DIR (default .next). Usage: npm run bench:capture
import { randomBytes } from "node:crypto";
import { existsSync, mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { chromium, type Page } from "playwright-core";
import { DEMO_PEOPLE, seedBenchDatabase } from "../db/seed";
import { DEMO_CASES, DEMO_KITS } from "../db/seed-library";
import { freePort, root, startNext, waitFor } from "./lib.mjs";

const dist = process.env.NEXT_DIST_DIR || ".next";
const STEPS = 100;
const CORNERS = 200;

declare global {
  interface Window {
    __capture?: { work: number[]; frame: number[]; pending: number | null };
  }
}

const quantile = (xs: number[], q: number) => {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.max(0, Math.ceil(q * s.length) - 1))];
};
const fmt = (xs: number[]) => `median ${quantile(xs, 0.5).toFixed(2)} ms, p95 ${quantile(xs, 0.95).toFixed(2)} ms`;

/** An invented case: a 200-corner deck (a slightly wavy circle of 60 mm radius), a round mouth, four studs, two passages. */
function benchCase(name: string) {
  const deck: [number, number][] = Array.from({ length: CORNERS }, (_, i) => {
    const a = (2 * Math.PI * i) / CORNERS;
    const r = 60 + 0.8 * Math.sin(6 * a);
    return [Number((r * Math.cos(a)).toFixed(3)), Number((r * Math.sin(a)).toFixed(3))];
  });
  const passage = (sx: number): [number, number][] => [[sx * 38, -10], [sx * 34, -9], [sx * 33.5, 0], [sx * 34, 9], [sx * 38, 10]];
  return {
    name,
    data: {
      deck: { kind: "polygon", pointsMm: deck },
      mouth: { outline: { kind: "circle", diameterMm: 50 }, depthMm: 27 },
      // The first demo case's studs, which the first two demo kits share.
      studs: DEMO_CASES[0].data.studs,
      studHoleDiameterMm: 8.5,
      pockets: [
        { label: "left transfer", outline: { kind: "polygon", pointsMm: passage(-1) } },
        { label: "right transfer", outline: { kind: "polygon", pointsMm: passage(1).reverse() } },
      ],
      stockBoreMm: 44,
      strokeMm: 40,
    },
    mouthReadingsMm: [50],
  };
}

/**
 * Records, for each input event of the kind, the time until the page had handled it (a pointer move: the
 * plan's markup changed; a keystroke: the form's handlers and React's render ran) and until the next
 * animation frame.
 */
async function listen(page: Page, type: "pointermove" | "input", hostSelector = "form") {
  await page.evaluate(([kind, sel]) => {
    const host = document.querySelector(sel) as HTMLElement;
    const m = { work: [] as number[], frame: [] as number[], pending: null as number | null };
    window.__capture = m;
    if (kind === "input") {
      // After React's own listener (on the root, below the window) and its render in the microtask after it.
      addEventListener("input", (e) => {
        const t0 = e.timeStamp;
        queueMicrotask(() => {
          m.work.push(performance.now() - t0);
          requestAnimationFrame(() => m.frame.push(performance.now() - t0));
        });
      });
      return;
    }
    addEventListener(kind, (e) => void (m.pending = e.timeStamp), { capture: true });
    new MutationObserver(() => {
      const t0 = m.pending;
      if (t0 === null) return;
      m.pending = null;
      m.work.push(performance.now() - t0);
      requestAnimationFrame(() => m.frame.push(performance.now() - t0));
    }).observe(host, { subtree: true, childList: true, attributes: true, characterData: true });
  }, [type, hostSelector] as const);
}

/**
 * The floor of the same page: a bare element laid over it whose own pointer-move listener writes one
 * attribute, dragged over as the corner is and measured the same way. What it takes is the browser's input
 * path and frame clock on this machine, with nothing of the form.
 */
async function dragBare(page: Page, label: string) {
  await page.evaluate(() => {
    const el = document.createElement("div");
    el.id = "bench-floor";
    el.style.cssText = "position:fixed;left:20px;top:20px;width:400px;height:300px;background:#eee;z-index:99";
    el.addEventListener("pointermove", (e) => el.setAttribute("data-at", `${e.clientX},${e.clientY}`));
    document.body.append(el);
  });
  const m = await measuredDrag(page, 120, 120, "#bench-floor");
  await page.evaluate(() => document.getElementById("bench-floor")?.remove());
  console.log(`  ${label}:`);
  console.log(`    pointer move to the element updated: ${fmt(m?.work ?? [])}`);
  console.log(`    pointer move to the next frame:      ${fmt(m?.frame ?? [])}`);
}

/** Presses at (x, y), moves 4 px to start the drag, then takes STEPS pointer moves, each waited on until its frame; returns what was measured. */
async function measuredDrag(page: Page, x: number, y: number, hostSelector?: string) {
  await page.mouse.move(x, y);
  await page.mouse.down();
  await page.mouse.move(x + 4, y);
  await listen(page, "pointermove", hostSelector);
  for (let i = 1; i <= STEPS; i++) {
    await page.mouse.move(x + 4 + i * 1.5, y + (i % 2));
    await page.waitForFunction((n) => (window.__capture?.frame.length ?? 0) >= n, i, { timeout: 10_000 });
  }
  await page.mouse.up();
  return page.evaluate(() => window.__capture);
}

async function dragCorner(page: Page, label: string) {
  const handle = page.getByTestId("shape-plan").locator('[data-key="deck:0"]');
  await handle.scrollIntoViewIfNeeded();
  const box = await handle.boundingBox();
  if (!box) throw new Error("deck corner 1 is not drawn");
  const m = await measuredDrag(page, box.x + box.width / 2, box.y + box.height / 2);
  console.log(`  ${label}:`);
  console.log(`    pointer move to the plan updated: ${fmt(m?.work ?? [])}`);
  console.log(`    pointer move to the next frame:   ${fmt(m?.frame ?? [])}`);
}

async function typeCorner(page: Page, label: string) {
  const field = page.getByLabel("Deck corner 1 x (mm)", { exact: true });
  await field.focus();
  await listen(page, "input");
  for (let i = 1; i <= STEPS; i++) {
    await field.fill(String(60 + i / 10));
    await page.waitForFunction((n) => (window.__capture?.frame.length ?? 0) >= n, i, { timeout: 10_000 });
  }
  const m = await page.evaluate(() => window.__capture);
  console.log(`  ${label}:`);
  console.log(`    keystroke to the form updated: ${fmt(m?.work ?? [])}`);
  console.log(`    keystroke to the next frame:   ${fmt(m?.frame ?? [])}`);
}

async function main() {
  if (!existsSync(join(root, dist, "BUILD_ID"))) throw new Error(`no production build in ${dist}: run NEXT_DIST_DIR=${dist} npx next build first`);
  const dir = mkdtempSync(join(tmpdir(), "borewright-bench-"));
  const databaseURL = `file:${join(dir, "bench.db")}`;
  await seedBenchDatabase(databaseURL);
  const port = await freePort();
  const base = `http://127.0.0.1:${port}`;
  const server = startNext({ port, quiet: true, env: { DATABASE_URL: databaseURL, BETTER_AUTH_URL: base, BETTER_AUTH_SECRET: randomBytes(32).toString("base64url"), PAYMENTS: "off" } });
  const browser = await chromium.launch({
    executablePath: "/usr/bin/chromium",
    args: ["--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
  });
  try {
    await waitFor(`${base}/sign-in`, 60_000, server);
    const page = await browser.newPage({ viewport: { width: 1600, height: 1100 } });
    const owner = DEMO_PEOPLE[0];
    await page.goto(`${base}/sign-in`);
    await page.getByLabel("E-mail").fill(owner.email);
    await page.getByLabel("Password").fill(owner.password);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL(/\/home/);
    const made = await page.request.post(`${base}/api/v1/cases`, { data: benchCase(`Bench case, ${CORNERS} corners`), headers: { origin: base } });
    if (made.status() !== 201) throw new Error(`the bench case was refused: ${made.status()} ${await made.text()}`);
    const id = ((await made.json()) as { item: { id: string } }).item.id;
    await page.goto(`${base}/library/cases/${id}`);
    await page.getByTestId("shape-plan").locator('[data-key="deck:199"]').waitFor({ timeout: 30_000 });
    await page.getByRole("group", { name: "Units of this form" }).getByRole("button", { name: "mm" }).click();

    console.log(`case form, ${CORNERS}-corner deck, ${STEPS} steps each:`);
    for (const [i, k] of DEMO_KITS.slice(0, 2).entries()) await page.getByLabel(`Kit ${i + 1} to try`).selectOption({ label: k.name });
    await page.getByTestId("case-trial").getByRole("listitem").nth(1).waitFor();
    await dragCorner(page, "drag a deck corner, plan and live result for two kits");
    console.log(`    live result after the drag: ${(await page.getByTestId("case-trial").innerText()).replace(/\s+/g, " ")}`);

    await page.getByLabel("Kit 2 to try").selectOption({ label: "no kit" });
    await page.getByLabel("Kit 1 to try").selectOption({ label: "no kit" });
    await dragCorner(page, "baseline: the same drag, plan only (no live result)");

    await dragBare(page, "floor: a bare element over the same page, one attribute written per move");

    await page.getByRole("button", { name: "Hide the plan" }).click();
    await typeCorner(page, "baseline: the same corner typed into its x field, plan hidden, no live result");
  } finally {
    await browser.close();
    server.kill("SIGTERM");
    rmSync(dir, { recursive: true, force: true });
  }
}

main().catch((e: unknown) => {
  console.error(e);
  process.exit(1);
});
