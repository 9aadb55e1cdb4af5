import { mkdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { type Browser, type BrowserContext, type Page, chromium } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { evaluateStudy, parseStudy } from "@/geometry";
import { fitState } from "@/scene/fit";
import { me, insertExampleStudy } from "../integration/jobs-support";
import { newPerson, signInThroughForm, waitUntilDrawn } from "../support/browser";
import { DEMO, signIn } from "../support/http";

// The fit studio on the public example page, in Chromium with WebGL on SwiftShader. The verdict
// threshold is whatever the core gives on the slider's own grid; the page must agree with it.

const SHOTS = "test-results/screenshots";
const STEP = 0.05;
let browser: Browser;
let context: BrowserContext;
let page: Page;
const consoleLines: string[] = [];

const example = parseStudy(JSON.parse(readFileSync("public/examples/study.json", "utf8")));

/** Smallest cut diameter on the slider grid at which the core says the first kit's skirt clears by the minimum. */
/** The fit state the core gives the example at cut diameter d: what the verdict must show for that cut. */
function coreStateAt(d: number): string {
  const r = evaluateStudy({ ...example, cut: { diameterMm: d } });
  return fitState(r.kits[0], r);
}

function coreThresholdMm(from: number): number {
  for (let i = 0; i < 400; i++) {
    const d = Math.round((from + i * STEP) * 100) / 100;
    const r = evaluateStudy({ ...example, cut: { diameterMm: d } });
    if (fitState(r.kits[0], r) === "clear") return d;
  }
  throw new Error("no clearing cut on the grid");
}

/** Waits until the canvas's last frame shows what the studio asks for (the view, the kit and the cut). */
const drawn = (timeout = 10_000) => waitUntilDrawn(page, timeout);

/** A 64 × 48 sample of the canvas (RGB) once it shows the current state, taken through a 2D canvas (the WebGL buffer is preserved). */
async function sample(): Promise<number[]> {
  await drawn();
  return page.evaluate(() => {
    const src = document.querySelector<HTMLCanvasElement>("[data-testid=view] canvas");
    if (!src) throw new Error("no canvas");
    const c = document.createElement("canvas");
    c.width = 64;
    c.height = 48;
    const ctx = c.getContext("2d");
    if (!ctx) throw new Error("no 2d context");
    ctx.drawImage(src, 0, 0, 64, 48);
    return Array.from(ctx.getImageData(0, 0, 64, 48).data).filter((_, i) => i % 4 !== 3);
  });
}
const difference = (a: number[], b: number[]) => a.reduce((s, v, i) => s + Math.abs(v - b[i]), 0) / a.length;

async function shot(name: string) {
  await page.screenshot({ path: join(SHOTS, `studio-${name}.png`) });
}

beforeAll(async () => {
  mkdirSync(SHOTS, { recursive: true });
  browser = await chromium.launch({
    executablePath: "/usr/bin/chromium",
    args: ["--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync", "--use-angle=swiftshader", "--enable-unsafe-swiftshader"],
    // playwright launches every browser with a fresh temporary profile of its own.
  });
  context = await browser.newContext({ viewport: { width: 1400, height: 1000 }, acceptDownloads: true });
  page = await context.newPage();
  page.on("console", (m) => consoleLines.push(`${m.type()}: ${m.text()}`));
  await page.goto(`${inject("baseURL")}/try`);
  await page.waitForSelector("[data-testid=view] canvas", { timeout: 30_000 });
  await drawn(30_000);
});

afterAll(async () => {
  await browser?.close();
});

describe("the fit studio on the example study", () => {
  it("renders the 3D view with more than a background", async () => {
    const px = await sample();
    // The background is #f1eee6; count samples that differ from it clearly.
    let drawn = 0;
    for (let i = 0; i < px.length; i += 3) if (Math.abs(px[i] - 0xf1) + Math.abs(px[i + 1] - 0xee) + Math.abs(px[i + 2] - 0xe6) > 30) drawn++;
    expect(drawn / (px.length / 3)).toBeGreaterThan(0.08);
    await shot("first-load");
  });

  it("loads without errors and without three.js warnings (the Clock deprecation included) in the console", async () => {
    expect(consoleLines.filter((l) => l.startsWith("error:") || l.includes("THREE."))).toEqual([]);
  });

  it("turns from interference to clear at the cut diameter the core gives, stepping the slider", async () => {
    const start = 53.5;
    const threshold = coreThresholdMm(start);
    const field = page.getByTestId("cut-diameter-field");
    await field.fill(String(start));
    await field.press("Enter");
    const verdict = page.getByTestId("verdict");
    await expect.poll(() => verdict.getAttribute("data-state")).toBe("interfere");
    await shot("interference");
    // A few steps below the threshold (every grid value from the start up to it is not clear), then step up to it.
    const below = Math.round((threshold - 3 * STEP) * 100) / 100;
    await field.fill(String(below));
    await field.press("Enter");
    const slider = page.getByTestId("cut-diameter");
    await expect.poll(() => slider.inputValue()).toBe(String(below));
    // The verdict says which cut it is for, so each state is read for the cut just set.
    await expect.poll(() => verdict.getAttribute("data-cut")).toBe(below.toFixed(2));
    expect(await verdict.getAttribute("data-state")).toBe(coreStateAt(below));
    await slider.focus();
    for (let i = 0; i < 2; i++) await slider.press("ArrowRight");
    await expect.poll(() => slider.inputValue()).toBe(String(Math.round((threshold - STEP) * 100) / 100));
    await expect.poll(() => verdict.getAttribute("data-cut")).toBe((threshold - STEP).toFixed(2));
    expect(await verdict.getAttribute("data-state")).toBe(coreStateAt(Math.round((threshold - STEP) * 100) / 100));
    await slider.press("ArrowRight");
    expect(Number(await slider.inputValue())).toBeCloseTo(threshold, 6);
    await expect.poll(() => verdict.getAttribute("data-cut")).toBe(threshold.toFixed(2));
    expect(await verdict.getAttribute("data-state")).toBe("clear");
    expect(await verdict.getAttribute("data-verdict")).toBe("fits-after-cut");
    await shot("clear-at-threshold");
  }, 120_000);

  it("writes the view's labels over it, inside the view box, for the cut on show, hidden from assistive technology", async () => {
    await drawn();
    const layer = page.getByTestId("fit-labels");
    // The figures are the results panel's in words; the labels are decoration of the labelled image.
    expect(await layer.getAttribute("aria-hidden")).toBe("true");
    const cut = (await page.getByTestId("verdict").getAttribute("data-cut")) ?? "";
    const shown = () => layer.locator("[data-label]").evaluateAll((els) => els.filter((e) => getComputedStyle(e).visibility === "visible").map((e) => e.textContent ?? ""));
    await expect.poll(shown).toContainEqual(expect.stringContaining(`cut Ø ${cut} mm ×`));
    expect(await shown()).toContainEqual(expect.stringMatching(/skirt Ø [\d.]+ mm · clearance \+[\d.]+ mm/));
    expect(await shown()).toContainEqual(expect.stringMatching(/thinnest wall [\d.]+ mm/));
    const view = await page.getByTestId("view").boundingBox();
    if (!view) throw new Error("no view box");
    const boxes = await layer.locator("[data-label]").evaluateAll((els) =>
      els.filter((e) => getComputedStyle(e).visibility === "visible").map((e) => {
        const r = e.getBoundingClientRect();
        return { x: r.x + r.width / 2, y: r.y + r.height / 2, h: r.height };
      }),
    );
    for (const b of boxes) {
      expect(b.x).toBeGreaterThan(view.x);
      expect(b.x).toBeLessThan(view.x + view.width);
      expect(b.y).toBeGreaterThan(view.y);
      expect(b.y).toBeLessThan(view.y + view.height);
      // Readable, and not larger than a line of a heading.
      expect(b.h).toBeGreaterThan(8);
      expect(b.h).toBeLessThan(40);
    }
    // A step of the slider rewrites the cut label in the same frame.
    const slider = page.getByTestId("cut-diameter");
    await slider.focus();
    await slider.press("ArrowRight");
    const next = (Number(cut) + STEP).toFixed(2);
    await expect.poll(() => page.getByTestId("verdict").getAttribute("data-cut")).toBe(next);
    await drawn();
    expect(await shown()).toContainEqual(expect.stringContaining(`cut Ø ${next} mm ×`));
  });

  it("follows a mouse drag of the cut diameter from interference to clear", async () => {
    const field = page.getByTestId("cut-diameter-field");
    await field.fill("52");
    await field.press("Enter");
    const verdict = page.getByTestId("verdict");
    await expect.poll(() => verdict.getAttribute("data-state")).toBe("interfere");
    const box = await page.getByTestId("cut-diameter").boundingBox();
    if (!box) throw new Error("no slider box");
    const min = Number(await page.getByTestId("cut-diameter").getAttribute("min"));
    const max = Number(await page.getByTestId("cut-diameter").getAttribute("max"));
    const xOf = (mm: number) => box.x + 8 + ((mm - min) / (max - min)) * (box.width - 16);
    await page.mouse.move(xOf(52), box.y + box.height / 2);
    await page.mouse.down();
    for (let i = 1; i <= 5; i++) await page.mouse.move(xOf(52 + (i * 3.6) / 5), box.y + box.height / 2);
    await page.mouse.up();
    const reached = Number(await page.getByTestId("cut-diameter").inputValue());
    expect(reached).toBeGreaterThan(55.2);
    await expect.poll(() => verdict.getAttribute("data-state")).toBe(reached >= coreThresholdMm(52) ? "clear" : "tight");
  }, 120_000);

  it("turns the section plane off and rotates it", async () => {
    await page.getByTestId("use-least-cut").click();
    const on = await sample();
    await page.getByTestId("section-toggle").uncheck();
    await expect.poll(() => page.getByTestId("view").getAttribute("data-section")).toBe("off");
    const off = await sample();
    expect(difference(on, off)).toBeGreaterThan(2);
    await shot("section-off");
    await page.getByTestId("section-toggle").check();
    const angle = page.getByTestId("section-angle");
    await angle.focus();
    for (let i = 0; i < 9; i++) await angle.press("ArrowRight");
    await expect.poll(() => page.getByTestId("view").getAttribute("data-section")).toBe("45");
    const turned = await sample();
    expect(difference(on, turned)).toBeGreaterThan(2);
    await shot("section-45");
  });

  it("moves the camera to each preset", async () => {
    const views: Record<string, number[]> = {};
    for (const p of ["plan", "section", "three-quarter"]) {
      await page.getByTestId(`camera-${p}`).click();
      await expect.poll(() => page.getByTestId("view").getAttribute("data-camera")).toBe(p);
      views[p] = await sample();
      await shot(`camera-${p}`);
    }
    expect(difference(views.plan, views["three-quarter"])).toBeGreaterThan(2);
    expect(difference(views.section, views["three-quarter"])).toBeGreaterThan(2);
    expect(difference(views.plan, views.section)).toBeGreaterThan(2);
  });

  it("downloads a PNG snapshot of the view and the drawings as SVG", async () => {
    const [png] = await Promise.all([page.waitForEvent("download"), page.getByTestId("snapshot").click()]);
    expect(png.suggestedFilename()).toMatch(/-fit\.png$/);
    const bytes = readFileSync((await png.path()) as string);
    expect(bytes.subarray(0, 8).toString("hex")).toBe("89504e470d0a1a0a");
    expect(bytes.length).toBeGreaterThan(10_000);
    // The drawings follow the cut a moment after it settles.
    await expect.poll(() => page.getByTestId("plan-drawing").innerHTML()).toContain("cut Ø 55.10 mm");
    const [svg] = await Promise.all([page.waitForEvent("download"), page.getByTestId("download-plan").click()]);
    const text = readFileSync((await svg.path()) as string, "utf8");
    expect(text).toMatch(/^<svg [^>]*width="[\d.]+mm"/);
    expect(text).toContain("cut Ø 55.10 mm");
  });

  it("shows the customer the fit in large type without the editing controls", async () => {
    await page.getByTestId("customer-toggle").click();
    await expect.poll(() => page.getByTestId("cut-diameter").count()).toBe(0);
    expect(await page.getByTestId("verdict").textContent()).toContain("Fits after the cut");
    await shot("customer");
    await page.getByTestId("customer-toggle").click();
    await expect.poll(() => page.getByTestId("cut-diameter").count()).toBe(1);
  });

  it("compares the kits side by side and overlaid", async () => {
    await page.getByTestId("compare").selectOption("side");
    await expect.poll(() => page.getByRole("list", { name: "Kits side by side" }).locator("svg").count()).toBe(example.kits.length);
    await shot("side-by-side");
    await page.getByTestId("compare").selectOption("overlay");
    await page.getByTestId("kit-1").check();
    await expect.poll(() => page.getByTestId("kit-results").locator("h2").textContent()).toBe(example.kits[1].name);
    await page.evaluate(() => window.scrollTo(0, 0));
    await shot("overlay");
  });
});

describe("the study page", () => {
  let shop: BrowserContext;
  let bench: Page;
  let studyId: string;
  beforeAll(async () => {
    const owner = await signIn(DEMO.owner.email, DEMO.owner.password);
    const o = await me(owner);
    ({ studyId } = await insertExampleStudy(o.shopId, o.userId, `Studio study ${Date.now()}`));
    shop = await newPerson(browser, { width: 1400, height: 1000 });
    bench = await shop.newPage();
    await signInThroughForm(bench, DEMO.builder.email, DEMO.builder.password);
    await bench.goto(`/studies/${studyId}`);
    await bench.getByTestId("kit-results").waitFor({ timeout: 30_000 });
  });
  afterAll(async () => {
    await shop?.close();
  });

  it("has one units toggle, the header's", async () => {
    expect(await bench.getByRole("group", { name: "Length units" }).count()).toBe(1);
    expect(await bench.getByRole("group", { name: "Units of this form" }).count()).toBe(0);
  });

  it("while the cut field holds a half-typed value, says the results are for the last valid one and names it", async () => {
    const field = bench.getByRole("region", { name: "Cut plan" }).getByLabel("Cut diameter");
    const planned = bench.getByTestId("kit-results").getByTestId("planned-cut");
    await field.fill("55.5");
    await expect.poll(() => planned.textContent()).toContain("55.50 mm");
    await expect.poll(() => bench.getByTestId("stale-results").count()).toBe(0);
    await field.fill("\u221255");
    const notice = bench.getByTestId("stale-results");
    await expect.poll(() => notice.count()).toBe(1);
    expect(await notice.textContent()).toMatch(/Cut diameter reads “\u221255”; the results use 55\.50 mm/);
    // The results themselves still show the last valid value, never the typed one without its sign.
    expect(await planned.textContent()).toContain("55.50 mm");
    await field.fill("55.6");
    await expect.poll(() => notice.count()).toBe(0);
    await expect.poll(() => planned.textContent()).toContain("55.60 mm");
  });

  it("keeps the studio's least cut as the least cut: the plan's fields stay blank and the figure follows", async () => {
    await bench.getByTestId("use-least-cut").click();
    const field = bench.getByRole("region", { name: "Cut plan" }).getByLabel("Cut diameter");
    await expect.poll(() => field.inputValue()).toBe("");
    await expect.poll(() => bench.getByTestId("cut-mode").textContent()).toMatch(/least cut and follows the readings/);
    // The plan shows the least cut as the least cut (it follows the readings), not as a number someone set.
    await expect.poll(() => bench.getByTestId("kit-results").getByTestId("planned-cut").textContent()).toMatch(/the least cut for this kit/);
  });

  it("shows each thing once: one verdict, one kit picker, one set of cautions, one list of warnings", async () => {
    expect(await bench.getByTestId("verdict").count()).toBe(1);
    expect(await bench.getByRole("region", { name: "Fit results" }).count()).toBe(1);
    expect(await bench.getByRole("group", { name: "Kit shown" }).count()).toBe(0);
    expect(await bench.getByTestId("cautions").count()).toBe(1);
    expect(await bench.getByText("Worth a look").count()).toBe(0);
    expect(await bench.getByRole("region", { name: "Rig set-up" }).count()).toBe(1);
    await bench.setViewportSize({ width: 1440, height: 1000 });
    await bench.screenshot({ path: join(SHOTS, "study-1440.png"), fullPage: true });
    await bench.setViewportSize({ width: 1400, height: 1000 });
  });

  it("says the depth stop as the setup card does: the ring's groove, the shims under it and where it stops", async () => {
    const stop = bench.getByTestId("depth-stop");
    await expect.poll(() => stop.innerText()).toMatch(/ring in groove \d+ (with \d+\.\d{2} mm of shims|, no shims): stops at \d+\.\d{2} mm/);
    expect(await stop.innerText()).not.toMatch(/groove \d+ \+/);
  });

  it("reads on a phone: the study page at 390 px wide has no sideways scroll", async () => {
    await bench.setViewportSize({ width: 390, height: 844 });
    await bench.getByTestId("kit-results").waitFor();
    await expect.poll(() => bench.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    await bench.screenshot({ path: join(SHOTS, "study-390.png"), fullPage: true });
    await bench.setViewportSize({ width: 1400, height: 1000 });
  });
});
