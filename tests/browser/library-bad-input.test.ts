// Bad input in the library forms, in Chromium: a negative diameter, a comma for a decimal point and a
// 500 mm skirt each get a message next to the field, and a refused save loses nothing that was typed.
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { FIT, printed } from "@/model/palette";
import { closeBrowser, launchSignedIn, screenshot } from "../support/browser";
import { DEMO } from "../support/http";
import { inMillimetres, openNewForm } from "../support/library-forms";

let browser: Browser;
let page: Page;

/** The message shown next to an input (its aria-describedby target, or the alert right after it). */
async function messageNear(p: Page, inputId: string): Promise<string> {
  const describedBy = await p.locator(`#${inputId}`).getAttribute("aria-describedby");
  if (describedBy) return p.locator(`#${describedBy.split(" ")[0]}`).innerText();
  return "";
}

beforeAll(async () => {
  ({ browser, page } = await launchSignedIn(DEMO.builder, { width: 1024, height: 1300 }));
  await page.waitForURL(/\/home/);
});

afterAll(() => closeBrowser(browser));

describe("bad input in the kit form", () => {
  it("names what is wrong next to each field and keeps every character typed", async () => {
    await openNewForm(page, "kits", "Bad input kit");

    await page.locator("#f-boreMm").fill("-47");
    await expect.poll(() => messageNear(page, "f-boreMm")).toMatch(/more than 0\.00 mm|more than 0 mm/);

    await page.locator("#f-skirtDiameterReadingsMm-0").fill("54,5");
    await expect.poll(() => messageNear(page, "f-skirtDiameterReadingsMm-0")).toBe("use a point for decimals: 54.5");

    await page.getByRole("group", { name: /Skirt diameter readings/ }).getByRole("button", { name: "Add a reading" }).click();
    await page.locator("#f-skirtDiameterReadingsMm-1").fill("500");
    await expect.poll(() => messageNear(page, "f-skirtDiameterReadingsMm-1")).toMatch(/too large.*at most 200 mm/);

    await page.getByRole("button", { name: "Create" }).click();
    await expect.poll(() => page.getByRole("alert").first().innerText()).toMatch(/nothing was saved and nothing was lost/);
    expect(page.url()).toMatch(/\/library\/kits\/new$/);
    expect(await page.locator("#f-name").inputValue()).toBe("Bad input kit");
    expect(await page.locator("#f-boreMm").inputValue()).toBe("-47");
    expect(await page.locator("#f-skirtDiameterReadingsMm-0").inputValue()).toBe("54,5");
    expect(await page.locator("#f-skirtDiameterReadingsMm-1").inputValue()).toBe("500");
    await screenshot(page, "library-bad-input");

    // Switching to inches converts what can be read and leaves the rest exactly as typed.
    await page.getByRole("group", { name: "Units of this form" }).getByRole("button", { name: "in" }).click();
    await expect.poll(() => page.locator("#f-skirtDiameterReadingsMm-1").inputValue()).toBe("19.685");
    expect(await page.locator("#f-skirtDiameterReadingsMm-0").inputValue()).toBe("54,5");
    await expect.poll(() => messageNear(page, "f-skirtDiameterReadingsMm-1")).toMatch(/at most 7\.874 in/);

    // Fixing the values clears the messages.
    await inMillimetres(page);
    await page.locator("#f-boreMm").fill("47");
    await page.locator("#f-skirtDiameterReadingsMm-0").fill("54.5");
    await page.locator("#f-skirtDiameterReadingsMm-1").fill("54.55");
    await expect.poll(() => messageNear(page, "f-boreMm")).toBe("");
    await expect.poll(() => messageNear(page, "f-skirtDiameterReadingsMm-0")).toBe("");
    await expect.poll(() => page.getByTestId("f-skirtDiameterReadingsMm-summary").innerText()).toMatch(/largest counts: 54\.55 mm \(reading 2\) · spread 0\.05 mm/);
  });
});

describe("bad input in the case form", () => {
  it("shows a deck whose edges cross in the warning colour, says which edges, and refuses to save it", async () => {
    await openNewForm(page, "cases", "Crossed deck case");
    await page.getByRole("radiogroup", { name: "Deck shape" }).getByLabel("Polygon (corners)").check();
    // A bow tie: (−50, −50) → (50, 50) → (50, −50) → (−50, 50) crosses itself between edges 1 and 3.
    const corners = [["-50", "-50"], ["50", "50"], ["50", "-50"], ["-50", "50"]];
    for (const [i, [x, y]] of corners.entries()) {
      await page.getByRole("group", { name: "Deck", exact: true }).getByRole("button", { name: "Add a corner" }).click();
      await page.getByLabel(`Deck corner ${i + 1} x (mm)`, { exact: true }).fill(x);
      await page.getByLabel(`Deck corner ${i + 1} y (mm)`, { exact: true }).fill(y);
    }
    await expect.poll(() => page.getByTestId("shape-issues").innerText()).toMatch(/deck outline: polygon edges 1 and 3 cross/);
    expect(await page.getByTestId("shape-plan").locator('path[data-key="deck"]').getAttribute("stroke")).toBe(printed(FIT.interfere));
    await expect.poll(() => page.getByRole("group", { name: "Deck", exact: true }).getByRole("alert").first().innerText()).toMatch(/edges 1 and 3 cross/);

    await page.getByRole("button", { name: "Create" }).click();
    await expect.poll(() => page.getByRole("alert").first().innerText()).toMatch(/nothing was saved and nothing was lost/);
    expect(page.url()).toMatch(/\/library\/cases\/new$/);
    expect(await page.getByLabel("Deck corner 4 y (mm)", { exact: true }).inputValue()).toBe("50");
  });
});
