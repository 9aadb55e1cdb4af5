// Journey 1 of the product brief, walked by clicking as a new hobby builder would: sign up, describe the case,
// add the kit (two skirt readings of their own), add the boring rig, open a study, switch to inches and back,
// enter the holder heights, open a job for their own engine and print the setup card. At a desktop width and
// at a phone's, with no page error and no console error on the way. The only address typed is the first.
import type { Browser, BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launchBrowser, newPerson, screenshot, signUpThroughForm } from "../support/browser";
import { uniqueEmail } from "../support/http";
import { measurePdf } from "../integration/jobs-pdf-measure";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

/** Page errors and console errors of a page, as they happen. */
function watch(page: Page): string[] {
  const problems: string[] = [];
  page.on("pageerror", (e) => problems.push(`page error: ${e.message}`));
  page.on("console", (m) => {
    if (m.type() === "error") problems.push(`console error: ${m.text()}`);
  });
  return problems;
}

async function home(page: Page) {
  await page.getByRole("link", { name: "Borewright" }).first().click();
  await page.waitForURL(/\/home$/);
}

/** Follows one of the home page's first steps to its form and names what the form makes. */
async function openStep(page: Page, step: string, form: RegExp, name: string) {
  await page.getByRole("link", { name: step }).click();
  await page.waitForURL(form);
  await page.getByRole("textbox", { name: "Name", exact: true }).fill(name);
}

/** Creates the row of the library form on show and finds it on its shelf. */
async function createOnShelf(page: Page, shelf: "cases" | "kits" | "rigs", name: string) {
  await page.getByRole("button", { name: "Create" }).click();
  await page.waitForURL(new RegExp(`/library\\?kind=${shelf}`));
  await page.getByRole("link", { name }).waitFor();
}

async function walk(page: Page, tag: string) {
  const email = uniqueEmail(`journey-${tag}`);
  const CASE = `My 50 cc case (${tag})`;
  const KIT = `47 mm kit on my bench (${tag})`;
  const RIG = `My boring rig (${tag})`;

  // 1. Signs up from the landing page and lands in a shop of one, as its owner, told what to do first.
  await page.goto("/");
  await page.getByRole("link", { name: "Create an account" }).click();
  await signUpThroughForm(page, { name: "Tamsin Oakridge", email, password: "a-long-journey-password" });
  await page.waitForURL(/\/home$/);
  expect(await page.getByTestId("who").textContent()).toMatch(/Tamsin Oakridge's shop · owner/);
  const steps = page.getByRole("list").filter({ hasText: "Describe the crankcase" });
  expect(await steps.getByRole("link").allTextContents()).toEqual(["1 · Describe the crankcase", "2 · Add the candidate kits", "3 · Add your boring rig", "4 · Open a study"]);
  await screenshot(page, `journey-${tag}-01-home`);

  // 2. The case profile: a round mouth read three times (the smallest counts), four studs on a square, the deck.
  await openStep(page, "1 · Describe the crankcase", /\/library\/cases\/new$/, CASE);
  const mouth = page.getByRole("group", { name: /Mouth diameter readings/ });
  // The readings' inputs by their ids: the form shows each reading's label twice (list and drawing).
  await page.locator("#f-mouthReadingsMm-0").fill("46.02");
  for (const [i, v] of ["45.96", "46.00"].entries()) {
    await mouth.getByRole("button", { name: "Add a reading" }).click();
    await page.locator(`#f-mouthReadingsMm-${i + 1}`).fill(v);
  }
  await expect.poll(() => page.getByTestId("f-mouthReadingsMm-summary").innerText()).toMatch(/smallest counts: 45\.96 mm/);
  await page.getByLabel("Mouth depth before it opens into the crank chamber").fill("26");
  await page.getByLabel("Square pattern side (mm)").fill("56");
  await page.getByRole("button", { name: "Fill four studs" }).click();
  await page.getByLabel("Stud hole diameter").fill("7.5");
  await page.getByRole("group", { name: /^Deck/ }).getByLabel("Diameter").fill("110");
  await page.getByLabel("Stock bore").fill("40");
  await page.getByLabel("Stroke").fill("39.2");
  await createOnShelf(page, "cases", CASE);

  // 3. The kit from its listed data, the skirt diameter overridden with two readings of their own (the largest counts).
  await home(page);
  await openStep(page, "2 · Add the candidate kits", /\/library\/kits\/new$/, KIT);
  await page.getByLabel("Bore").fill("47");
  const skirt = page.getByRole("group", { name: /Skirt diameter readings/ });
  await page.locator("#f-skirtDiameterReadingsMm-0").fill("53.92");
  await skirt.getByRole("button", { name: "Add a reading" }).click();
  await page.locator("#f-skirtDiameterReadingsMm-1").fill("53.96");
  await page.locator("#f-skirtLengthReadingsMm-0").fill("24.6");
  await page.getByLabel("Copy studs from a case profile").selectOption({ label: CASE });
  await expect.poll(() => page.getByLabel("Stud 1 label").inputValue()).not.toBe("");
  await page.getByLabel("Price", { exact: true }).fill("289");
  await createOnShelf(page, "kits", KIT);

  // 4. The boring rig: head read with calipers, the bit's calibrated reach, the grooves and the washers at hand.
  await home(page);
  await openStep(page, "3 · Add your boring rig", /\/library\/rigs\/new$/, RIG);
  await page.getByLabel("Cutter head diameter, as measured (without the bit)").fill("34.5");
  await page.getByLabel("Radius of the outermost screw heads").fill("21");
  await page.getByLabel("Length of the bit installed now").fill("35");
  await page.getByLabel("Calibrated with a bit of length").fill("35");
  await page.getByLabel("Smallest cut it gave").fill("52.5");
  await page.getByLabel("Largest cut it gave").fill("62");
  const grooves = page.getByRole("group", { name: "Stop grooves" });
  for (const [i, travel] of ["22", "26", "30"].entries()) {
    if ((await grooves.getByLabel("Travel").count()) <= i) await grooves.getByRole("button", { name: "Add a groove" }).click();
    await grooves.getByLabel("Travel").nth(i).fill(travel);
  }
  const shims = page.getByRole("group", { name: "Shims and washers at hand" });
  for (const [i, [thickness, count]] of [["0.1", "5"], ["0.5", "4"], ["1", "4"]].entries()) {
    if ((await shims.getByLabel("Thickness").count()) <= i) await shims.getByRole("button", { name: "Add shims" }).click();
    await shims.getByLabel("Thickness").nth(i).fill(thickness);
    await shims.getByLabel("How many").nth(i).fill(count);
  }
  await page.getByLabel("Drill top speed").fill("2800");
  await createOnShelf(page, "rigs", RIG);

  // 5. The study: the shop's one rig is already picked; the verdict, the cut and the rig's set-up show at once.
  await home(page);
  await page.getByRole("link", { name: "4 · Open a study" }).click();
  await page.waitForURL(/\/studies$/);
  await page.getByRole("button", { name: "New study" }).first().click();
  const form = page.getByRole("form", { name: "New study" });
  await form.getByLabel("Name").fill(`Will the 47 fit? (${tag})`);
  await form.getByLabel("Case profile").selectOption({ label: CASE });
  await form.getByLabel(KIT).check();
  await expect.poll(async () => (await form.getByLabel("Boring rig (optional)").locator("option:checked").textContent()) ?? "").toBe(RIG);
  await form.getByRole("button", { name: "Create the study" }).click();
  await page.waitForURL(/\/studies\/[^/]+$/);
  const verdict = page.getByTestId("kit-results").getByTestId("verdict");
  await expect.poll(() => verdict.innerText()).toMatch(/Fits after the cut/);
  await screenshot(page, `journey-${tag}-02-study`);

  // Inches, because the calipers are in inches, and back.
  await page.getByRole("group", { name: "Length units" }).getByRole("button", { name: "in" }).click();
  await expect.poll(() => page.getByRole("group", { name: "Length units" }).getByRole("button", { name: "in" }).getAttribute("aria-pressed")).toBe("true");
  await expect.poll(() => page.getByTestId("kit-results").innerText()).toMatch(/\d\.\d{3} in/);
  await page.getByRole("group", { name: "Length units" }).getByRole("button", { name: "mm" }).click();
  await expect.poll(() => page.getByRole("group", { name: "Length units" }).getByRole("button", { name: "mm" }).getAttribute("aria-pressed")).toBe("true");
  await expect.poll(() => page.getByTestId("kit-results").innerText()).toMatch(/\d\.\d{2} mm/);

  // 6. The four holder heights as read; the study keeps them.
  const heights = page.getByRole("region", { name: "Holder heights" });
  await heights.getByRole("button", { name: "Add a reading at every stud" }).click();
  for (const [i, h] of ["30.02", "30.00", "29.98", "30.01"].entries()) await heights.getByLabel("Height").nth(i).fill(h);
  await expect.poll(() => page.getByTestId("save-status").getAttribute("data-status")).toBe("saved");
  await screenshot(page, `journey-${tag}-03-heights`);

  // A job for their own engine, opened from the study, and its setup card.
  await page.getByRole("link", { name: "Open a job for this study" }).click();
  await page.waitForURL(/\/jobs\/new\?studyId=/);
  await page.getByLabel("Title").fill("My scooter, 47 mm kit");
  await page.getByLabel("For my own engine").check();
  expect(await page.getByLabel("Customer's name").count()).toBe(0);
  await page.getByRole("button", { name: "Open the job" }).click();
  await page.waitForURL(/\/jobs\/[0-9a-f-]{36}$/);
  expect(await page.getByTestId("job-status").textContent()).toBe("Planned");
  await expect.poll(() => page.getByTestId("plan-verdict").innerText()).toMatch(/^Fits after the cut/);
  await page.getByRole("link", { name: "Setup card" }).click();
  await page.waitForURL(/\/setup-card\//);
  await expect.poll(() => page.getByTestId("card-verdict").innerText()).toMatch(/Fits after the cut — /);
  expect(await page.getByTestId("rig-settings").innerText()).toMatch(/Cutter setting/);
  await screenshot(page, `journey-${tag}-04-setup-card`);
  await page.emulateMedia({ media: "print" });
  const printed = await measurePdf(new Uint8Array(await page.pdf({ format: "A4", printBackground: true, preferCSSPageSize: true })));
  await page.emulateMedia({ media: "screen" });
  // The figures on one page and the two drawings after it, each stating its scale.
  // (The print's text runs come with extra spaces between words; they are folded before comparing.)
  const words = (t: string) => t.replace(/\s+/g, " ");
  expect(printed.length).toBe(3);
  expect(words(printed[0].text)).toMatch(/Wear eye protection/);
  for (const p of printed.slice(1)) expect(words(p.text)).toMatch(/Scale 1:\d/);
}

describe("journey 1: a hobby builder checks a kit before buying it", () => {
  for (const [tag, size] of [
    ["desk", { width: 1440, height: 900 }],
    ["phone", { width: 390, height: 844 }],
  ] as const) {
    it(`from sign-up to the printed setup card by clicking, at ${size.width} px`, async () => {
      const context: BrowserContext = await newPerson(browser, size);
      const page = await context.newPage();
      const problems = watch(page);
      try {
        await walk(page, tag);
        expect(problems).toEqual([]);
      } finally {
        await context.close();
      }
    }, 240_000);
  }
});
