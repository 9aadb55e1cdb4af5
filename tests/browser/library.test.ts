// The library and study journey in Chromium: a case profile and two kits made through the forms, a study
// built from them, the lineup sorted by thinnest wall, the study exported and imported back, and the same
// study edited in two tabs so that the second save is told about the first.
import { readFileSync } from "node:fs";
import type { Browser, BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeBrowser, launchSignedIn, screenshot } from "../support/browser";
import { DEMO, signIn as signInHttp } from "../support/http";
import { openNewForm, typeReadings, typeSquareStudCase } from "../support/library-forms";
import { newCase, newKit, newRig } from "../integration/library-fixtures";

const uid = Date.now().toString(36);
const CASE = `Journey case ${uid}`;
const KIT_A = `Journey 47 kit ${uid}`;
const KIT_B = `Journey 50 kit ${uid}`;

let browser: Browser;
let context: BrowserContext;
let page: Page;
const pageErrors: string[] = [];

async function createKit(p: Page, name: string, bore: string, skirts: string[], length: string, price: string) {
  await openNewForm(p, "kits", name);
  await p.locator("#f-boreMm").fill(bore);
  await typeReadings(p, "skirtDiameterReadingsMm", skirts);
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
  // A script error in the page fails the journey rather than hiding behind a timeout.
  ({ browser, context, page } = await launchSignedIn(DEMO.owner, { width: 1366, height: 900, pageErrors }));
  await page.waitForURL(/\/home/);
});

afterAll(() => closeBrowser(browser, pageErrors));

describe("library and studies in the browser", () => {
  it("creates a case profile from three mouth readings, the smallest counting", async () => {
    await openNewForm(page, "cases", CASE);
    await typeReadings(page, "mouthReadingsMm", ["46.02", "45.96", "46.00"]);
    await expect.poll(() => page.getByTestId("f-mouthReadingsMm-summary").innerText()).toMatch(/smallest counts: 45\.96 mm \(reading 2\) · spread 0\.06 mm/);
    await typeSquareStudCase(page);
    await screenshot(page, "library-case-form");
    await page.getByRole("button", { name: "Create" }).click();
    await page.waitForURL(/\/library\?kind=cases/);
    const row = page.getByRole("row", { name: new RegExp(CASE) });
    await expect.poll(() => row.innerText()).toContain("45.96 mm");
    await screenshot(page, "library-cases");
  });

  it("creates two kits whose studs are copied from the case", async () => {
    await createKit(page, KIT_A, "47", ["53.92", "53.96"], "24.6", "289");
    await createKit(page, KIT_B, "50", ["57.40", "57.45"], "26.4", "349");
    await page.getByLabel("Filter by name").fill(uid);
    await expect.poll(() => page.getByTestId("table-kits").locator("tbody tr").count()).toBe(2);
    await screenshot(page, "library-kits");
  });

  let studyUrl = "";
  let neededCuts: string[] = [];

  it("builds a study and sorts its lineup by thinnest wall", async () => {
    await page.goto("/studies");
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
    await screenshot(page, "library-study");

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
    await screenshot(page, "library-lineup");
  });

  it("exports the study and imports it back with the same results", async () => {
    await page.goto(studyUrl);
    const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("link", { name: "Export study file" }).click()]);
    const file = await download.path();
    const json = JSON.parse(readFileSync(file, "utf8")) as { kits: { name: string }[]; case: { name: string } };
    expect(json.kits.map((k) => k.name)).toEqual([KIT_A, KIT_B]);
    expect(json.case.name).toBe(CASE);

    await page.goto("/studies");
    await page.getByRole("button", { name: "Import a study file" }).click();
    await page.locator("input[type=file][aria-label='Study file']").setInputFiles({ name: "journey.study.json", mimeType: "application/json", buffer: readFileSync(file) });
    const link = page.getByRole("status").or(page.locator("[role=status]")).getByRole("link");
    await link.first().waitFor();
    await screenshot(page, "library-import");
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
    await screenshot(second, "library-conflict");
    await screenshot(first, "library-history");

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
    await page.goto("/library");
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
    await page.goto("/library?kind=kits");
    const kits = page.getByTestId("table-kits");
    await kits.getByRole("button", { name: /Bore/ }).click();
    await expect.poll(() => kits.locator("th[aria-sort]").first().innerText()).toMatch(/Bore/);
    await page.getByRole("navigation", { name: "Library sections" }).getByRole("link", { name: "Boring rigs" }).click();
    await page.getByTestId("table-rigs").locator("tbody tr").first().waitFor();
    expect(await page.getByText(/could not be loaded/).count()).toBe(0);
  });
});
