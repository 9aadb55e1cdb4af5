// The library and study journey in Chromium: a case profile and two kits made through the forms, a study
// built from them, the lineup sorted by thinnest wall, the study exported and imported back, and the same
// study edited in two tabs so that the second save is told about the first.
import { mkdirSync, readFileSync } from "node:fs";
import { chromium, type Browser, type BrowserContext, type Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it, inject } from "vitest";
import { DEMO, freshAddress, signIn as signInHttp } from "../support/http";
import { newCase, newKit, newRig } from "../integration/library-fixtures";

const SHOTS = "test-results/screenshots";
const ARGS = ["--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync", "--use-angle=swiftshader", "--enable-unsafe-swiftshader"];
const uid = Date.now().toString(36);
const CASE = `Journey case ${uid}`;
const KIT_A = `Journey 47 kit ${uid}`;
const KIT_B = `Journey 50 kit ${uid}`;

let browser: Browser;
let context: BrowserContext;
let page: Page;
const pageErrors: string[] = [];
const base = () => inject("baseURL");

async function signIn(p: Page, who: { email: string; password: string }) {
  await p.goto(`${base()}/sign-in`);
  await p.getByLabel("E-mail").fill(who.email);
  await p.getByLabel("Password").fill(who.password);
  await p.getByRole("button", { name: "Sign in" }).click();
  await p.waitForURL(/\/home/);
}

async function inMillimetres(p: Page) {
  await p.getByRole("group", { name: "Units of this form" }).getByRole("button", { name: "mm" }).click();
}

async function createKit(p: Page, name: string, bore: string, skirts: string[], length: string, price: string) {
  await p.goto(`${base()}/library/kits/new`);
  await inMillimetres(p);
  await p.locator("#f-name").fill(name);
  await p.locator("#f-boreMm").fill(bore);
  for (const [i, s] of skirts.entries()) {
    if (i > 0) await p.getByRole("group", { name: /Skirt diameter readings/ }).getByRole("button", { name: "Add a reading" }).click();
    await p.locator(`#f-skirtDiameterReadingsMm-${i}`).fill(s);
  }
  await p.locator("#f-skirtLengthReadingsMm-0").fill(length);
  await p.getByLabel("Copy studs from a case profile").selectOption({ label: CASE });
  await expect.poll(() => p.getByLabel("Stud 1 label").inputValue()).toBe("front left");
  await p.locator("#f-price").fill(price);
  await p.getByRole("button", { name: "Create" }).click();
  await p.waitForURL(/\/library\?kind=kits/);
  await p.getByRole("link", { name }).waitFor();
}

/** The kit names of the lineup, top to bottom. */
async function lineupOrder(p: Page): Promise<string[]> {
  return p.getByTestId("lineup").locator("tbody tr td:nth-child(2)").allInnerTexts();
}

beforeAll(async () => {
  mkdirSync(SHOTS, { recursive: true });
  browser = await chromium.launch({ executablePath: "/usr/bin/chromium", args: ARGS });
  context = await browser.newContext({ viewport: { width: 1366, height: 900 }, extraHTTPHeaders: { "x-forwarded-for": freshAddress() } });
  page = await context.newPage();
  // A script error in the page fails the journey rather than hiding behind a timeout.
  page.on("pageerror", (e) => pageErrors.push(e.message));
  await signIn(page, DEMO.owner);
});

afterAll(async () => {
  await browser?.close();
  expect(pageErrors).toEqual([]);
});

describe("library and studies in the browser", () => {
  it("creates a case profile from three mouth readings, the smallest counting", async () => {
    await page.goto(`${base()}/library/cases/new`);
    await inMillimetres(page);
    await page.locator("#f-name").fill(CASE);
    await page.locator("#f-mouthReadingsMm-0").fill("46.02");
    const mouth = page.getByRole("group", { name: /Mouth diameter readings/ });
    for (const [i, v] of ["45.96", "46.00"].entries()) {
      await mouth.getByRole("button", { name: "Add a reading" }).click();
      await page.locator(`#f-mouthReadingsMm-${i + 1}`).fill(v);
    }
    await expect.poll(() => page.getByTestId("f-mouthReadingsMm-summary").innerText()).toMatch(/smallest counts: 45\.96 mm \(reading 2\) · spread 0\.06 mm/);
    await page.locator("#f-mouth-depthMm").fill("26");
    await page.getByLabel("Square pattern side (mm)").fill("56");
    await page.getByRole("button", { name: "Fill four studs" }).click();
    await page.locator("#f-studHoleDiameterMm").fill("7.5");
    await page.locator("#f-deck-diameterMm").fill("110");
    await page.locator("#f-stockBoreMm").fill("40");
    await page.locator("#f-strokeMm").fill("39.2");
    await page.screenshot({ path: `${SHOTS}/library-case-form.png`, fullPage: true });
    await page.getByRole("button", { name: "Create" }).click();
    await page.waitForURL(/\/library\?kind=cases/);
    const row = page.getByRole("row", { name: new RegExp(CASE) });
    await expect.poll(() => row.innerText()).toContain("45.96 mm");
    await page.screenshot({ path: `${SHOTS}/library-cases.png`, fullPage: true });
  });

  it("creates two kits whose studs are copied from the case", async () => {
    await createKit(page, KIT_A, "47", ["53.92", "53.96"], "24.6", "289");
    await createKit(page, KIT_B, "50", ["57.40", "57.45"], "26.4", "349");
    await page.getByLabel("Filter by name").fill(uid);
    await expect.poll(() => page.getByTestId("table-kits").locator("tbody tr").count()).toBe(2);
    await page.screenshot({ path: `${SHOTS}/library-kits.png`, fullPage: true });
  });

  let studyUrl = "";
  let neededCuts: string[] = [];

  it("builds a study and sorts its lineup by thinnest wall", async () => {
    await page.goto(`${base()}/studies`);
    await page.getByRole("button", { name: "New study" }).first().click();
    await page.locator("#ns-name").fill(`Journey study ${uid}`);
    await page.locator("#ns-case").selectOption({ label: CASE });
    await page.getByLabel(KIT_A).check();
    await page.getByLabel(KIT_B).check();
    await page.getByRole("button", { name: "Create the study" }).click();
    await page.waitForURL(/\/studies\/[^/]+$/);
    studyUrl = page.url();
    await page.getByTestId("kit-results").getByTestId("verdict").waitFor();
    // The core on these two kits (Ø53.96 and Ø57.45 skirts, Ø45.96 mouth, 56 mm stud square): both fit after a cut.
    await expect.poll(() => page.getByTestId("kit-results").getByTestId("verdict").innerText()).toMatch(/Fits after the cut/);
    await page.screenshot({ path: `${SHOTS}/library-study.png`, fullPage: true });

    await page.getByRole("tab", { name: "Lineup" }).click();
    await page.getByTestId("window-chart").waitFor();
    await expect.poll(() => page.getByTestId("window-row").count()).toBe(2);
    const header = page.getByTestId("lineup").getByRole("button", { name: /Thinnest wall/ });
    await header.click();
    // The 50 mm kit needs the larger cut, so it leaves the thinner sealing land.
    await expect.poll(() => lineupOrder(page)).toEqual([KIT_B, KIT_A]);
    await header.click();
    await expect.poll(() => lineupOrder(page)).toEqual([KIT_A, KIT_B]);
    neededCuts = await page.getByTestId("lineup").locator("tbody tr td:nth-child(4)").allInnerTexts();
    expect(neededCuts.every((c) => /\d+\.\d+ mm/.test(c))).toBe(true);

    await page.getByLabel(`Choose ${KIT_A}`).check();
    await expect.poll(() => page.getByTestId("save-status").getAttribute("data-status"), { timeout: 10_000 }).toBe("saved");
    await page.screenshot({ path: `${SHOTS}/library-lineup.png`, fullPage: true });
  });

  it("exports the study and imports it back with the same results", async () => {
    await page.goto(studyUrl);
    const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("link", { name: "Export study file" }).click()]);
    const file = await download.path();
    const json = JSON.parse(readFileSync(file, "utf8")) as { kits: { name: string }[]; case: { name: string } };
    expect(json.kits.map((k) => k.name)).toEqual([KIT_A, KIT_B]);
    expect(json.case.name).toBe(CASE);

    await page.goto(`${base()}/studies`);
    await page.getByRole("button", { name: "Import a study file" }).click();
    await page.locator("input[type=file][aria-label='Study file']").setInputFiles({ name: "journey.study.json", mimeType: "application/json", buffer: readFileSync(file) });
    const link = page.getByRole("status").or(page.locator("[role=status]")).getByRole("link");
    await link.first().waitFor();
    await page.screenshot({ path: `${SHOTS}/library-import.png`, fullPage: true });
    await link.first().click();
    await page.waitForURL(/\/studies\/[^/]+$/);
    expect(page.url()).not.toBe(studyUrl);
    await page.getByRole("tab", { name: "Lineup" }).click();
    await page.getByTestId("lineup").waitFor();
    const header = page.getByTestId("lineup").getByRole("button", { name: /Thinnest wall/ });
    await header.click();
    await header.click();
    await expect.poll(() => page.getByTestId("lineup").locator("tbody tr td:nth-child(4)").allInnerTexts()).toEqual(neededCuts);
  });

  it("tells the second tab that someone else changed the study, and keeps its edit", async () => {
    const first = await context.newPage();
    const second = await context.newPage();
    await first.goto(studyUrl);
    await second.goto(studyUrl);
    await first.locator("#f-limits-minWallMm").waitFor();
    await second.locator("#f-limits-minWallMm").waitFor();

    await first.locator("#f-limits-minWallMm").fill("2.5");
    await expect.poll(() => first.getByTestId("save-status").getAttribute("data-status"), { timeout: 10_000 }).toBe("saved");
    await first.getByTestId("history").getByText(/wall/i).first().waitFor();

    await second.locator("#f-limits-minRadialClearanceMm").fill("0.6");
    await second.getByTestId("conflict").waitFor({ timeout: 10_000 });
    expect(await second.getByTestId("conflict").innerText()).toMatch(/Someone else changed this study/);
    expect(await second.locator("#f-limits-minRadialClearanceMm").inputValue()).toBe("0.6");
    await second.screenshot({ path: `${SHOTS}/library-conflict.png`, fullPage: true });
    await first.screenshot({ path: `${SHOTS}/library-history.png`, fullPage: true });

    await second.getByRole("button", { name: "Keep my edits and save them" }).click();
    await expect.poll(() => second.getByTestId("save-status").getAttribute("data-status"), { timeout: 10_000 }).toBe("saved");
  });
});

describe("the library's tabs", () => {
  // Every ordered pair of shelves once: cases→kits→cases→rigs→kits→rigs→cases.
  const walk = ["cases", "kits", "cases", "rigs", "kits", "rigs", "cases"] as const;
  const tab = { cases: "Case profiles", kits: "Cylinder kits", rigs: "Boring rigs" } as const;

  // Each shelf needs a row of its own to show; the test shop is seeded without a library.
  beforeAll(async () => {
    const owner = await signInHttp(DEMO.owner.email, DEMO.owner.password);
    await Promise.all([newCase(owner), newKit(owner), newRig(owner)]);
  });

  it("moves between every pair of shelves by clicking, each showing its own table", async () => {
    const errorsBefore = pageErrors.length;
    await page.goto(`${base()}/library`);
    await page.getByTestId("table-cases").waitFor();
    const nav = page.getByRole("navigation", { name: "Library sections" });
    for (const kind of walk.slice(1)) {
      await nav.getByRole("link", { name: tab[kind] }).click();
      await expect.poll(() => nav.getByRole("link", { name: tab[kind] }).getAttribute("aria-current")).toBe("page");
      await page.getByTestId(`table-${kind}`).locator("tbody tr").first().waitFor();
      expect(await page.getByText("Something went wrong").count()).toBe(0);
      expect(pageErrors.slice(errorsBefore)).toEqual([]);
    }
  });

  it("starts each shelf on its own sort, so a column of another shelf is never asked for", async () => {
    await page.goto(`${base()}/library?kind=kits`);
    const kits = page.getByTestId("table-kits");
    await kits.getByRole("button", { name: /Bore/ }).click();
    await expect.poll(() => kits.locator("th[aria-sort]").first().innerText()).toMatch(/Bore/);
    await page.getByRole("navigation", { name: "Library sections" }).getByRole("link", { name: "Boring rigs" }).click();
    await page.getByTestId("table-rigs").locator("tbody tr").first().waitFor();
    expect(await page.getByText(/could not be loaded/).count()).toBe(0);
  });
});
