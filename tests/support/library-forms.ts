// The library's forms as a person fills them in the browser tests: the shelf's new form in millimetres,
// readings typed one field each, and the round-decked case on a square of four studs most tests start from.
import type { Page } from "playwright-core";

/** Switches the form on show to millimetres. */
export async function inMillimetres(page: Page): Promise<void> {
  await page.getByRole("group", { name: "Units of this form" }).getByRole("button", { name: "mm" }).click();
}

/** Opens a shelf's form for a new row, in millimetres; with `name`, the row's name typed in. */
export async function openNewForm(page: Page, shelf: "cases" | "kits" | "rigs", name?: string): Promise<void> {
  await page.goto(`/library/${shelf}/new`);
  await inMillimetres(page);
  if (name !== undefined) await page.locator("#f-name").fill(name);
}

/** Types readings into a list of readings, adding a field for each after the first. */
export async function typeReadings(page: Page, list: "mouthReadingsMm" | "skirtDiameterReadingsMm", readings: string[]): Promise<void> {
  const group = page.getByRole("group", { name: list === "mouthReadingsMm" ? /Mouth diameter readings/ : /Skirt diameter readings/ });
  for (const [i, reading] of readings.entries()) {
    if (i > 0) await group.getByRole("button", { name: "Add a reading" }).click();
    await page.locator(`#f-${list}-${i}`).fill(reading);
  }
}

/**
 * The rest of a case profile once its mouth readings are in: the mouth 26 mm deep, four Ø 7.5 mm stud holes on a
 * 56 mm square, a Ø 110 mm round deck, a 40 mm stock bore and a 39.2 mm stroke.
 */
export async function typeSquareStudCase(page: Page): Promise<void> {
  await page.locator("#f-mouth-depthMm").fill("26");
  await page.getByLabel("Square pattern side (mm)").fill("56");
  await page.getByRole("button", { name: "Fill four studs" }).click();
  await page.locator("#f-studHoleDiameterMm").fill("7.5");
  await page.locator("#f-deck-diameterMm").fill("110");
  await page.locator("#f-stockBoreMm").fill("40");
  await page.locator("#f-strokeMm").fill("39.2");
}
