// The case profile form in Chromium: a photo chosen while the case is new is kept with it at the first save,
// with the reference points clicked on it, and they come back when the case is opened again; when the photo
// cannot be kept the case is still saved and its form says why; the optional crank chamber lengths are all or
// nothing, with the message next to the missing one.
import type { Browser, Locator, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeBrowser, launchSignedIn } from "../support/browser";
import { DEMO, signIn, type Http } from "../support/http";
import { openNewForm, typeReadings, typeSquareStudCase } from "../support/library-forms";
import { clickPhotoPixel, openPhotoPanel, textOf } from "../support/photo-surface";
import { greyPng } from "../support/png";
import { kitData, ok } from "../integration/library-fixtures";
import { signedLengthLabel } from "@/model/units";

const W = 800;
const H = 600;
const PHOTO = greyPng(W, H);
const PHOTO_SIZE = { widthPx: W, heightPx: H };
/** Four stud centres clicked on the photo, in its pixels: a square seen square on. */
const STUDS: [number, number][] = [[200, 500], [600, 500], [600, 100], [200, 100]];

let browser: Browser;
let page: Page;
let api: Http;
const pageErrors: string[] = [];
const uid = Date.now().toString(36);

beforeAll(async () => {
  api = await signIn(DEMO.owner.email, DEMO.owner.password);
  ({ browser, page } = await launchSignedIn(DEMO.owner, { width: 1500, height: 1900, pageErrors }));
});

afterAll(() => closeBrowser(browser, pageErrors));

type PhotoItem = { id: string; state: string; widthPx: number | null; heightPx: number | null; reference: { kind: string; points: [number, number][]; widthMm?: number; heightMm?: number } | null };

async function caseNamed(name: string): Promise<{ id: string } | undefined> {
  const { items } = ok<{ items: { id: string; name: string }[] }>(await api.get(`/api/v1/cases?q=${encodeURIComponent(name)}`));
  return items.find((c) => c.name === name);
}

async function photosOf(caseId: string): Promise<PhotoItem[]> {
  return ok<{ items: PhotoItem[] }>(await api.get(`/api/v1/cases/${caseId}/photos`)).items;
}

/** A new case profile's form in mm with every field a case needs filled in. */
async function newCaseForm(name: string) {
  await openNewForm(page, "cases");
  await page.locator("#f-name").fill(name);
  await typeReadings(page, "mouthReadingsMm", ["46"]);
  await typeSquareStudCase(page);
}

/** Chooses the photo and clicks the four studs as the reference with their measured spacing. */
async function chooseAndRefer(panel: Locator) {
  await panel.getByLabel(/Photo of the deck/).setInputFiles({ name: "deck.png", mimeType: "image/png", buffer: PHOTO });
  await expect.poll(() => textOf(panel.getByRole("status"))).toMatch(/kept with the case profile when you save it/);
  await panel.getByLabel(/Stud spacing across/).fill("56");
  await panel.getByLabel(/Stud spacing along/).fill("56");
  const surface = panel.getByTestId("trace-surface");
  for (const stud of STUDS) await clickPhotoPixel(surface, stud, PHOTO_SIZE);
  await expect.poll(() => textOf(panel.getByTestId("trace-fit"))).toMatch(/^The four points fit a 56(\.0+)? mm × 56(\.0+)? mm rectangle/);
}

describe("a photo chosen for a new case profile", () => {
  it("is kept with it at the first save, with its reference points, which come back when the case is opened", async () => {
    const name = `Photo case ${uid}`;
    await newCaseForm(name);
    await chooseAndRefer(await openPhotoPanel(page));
    await page.getByRole("button", { name: "Create" }).click();
    await page.waitForURL(/\/library\?kind=cases/);

    const saved = await caseNamed(name);
    expect(saved).toBeDefined();
    const photos = await photosOf(saved!.id);
    expect(photos).toHaveLength(1);
    expect(photos[0]).toMatchObject({ state: "ready", widthPx: W, heightPx: H, reference: { kind: "rectangle", widthMm: 56, heightMm: 56 } });
    // Each kept point lies where it was clicked, to within the photo pixels one screen pixel covers (the
    // photo is drawn smaller than its 800 px) and the click's rounding: 3 px.
    const kept = photos[0].reference!.points;
    for (const s of STUDS) expect(Math.min(...kept.map((p) => Math.hypot(p[0] - s[0], p[1] - s[1])))).toBeLessThan(3);

    await page.goto(`/library/cases/${saved!.id}`);
    const panel = await openPhotoPanel(page);
    const surface = panel.getByTestId("trace-surface");
    await expect.poll(() => surface.getAttribute("data-photo-width")).toBe(String(W));
    await expect.poll(() => panel.getByLabel(/Stud spacing across/).inputValue()).toMatch(/^56(\.0+)?$|^2\.205$/);
    await expect.poll(() => textOf(panel.getByTestId("trace-fit"))).toMatch(/^The four points fit a/);
    expect(await textOf(page.getByText(/^(Unsaved changes|No unsaved changes)$/))).toBe("No unsaved changes");

    // A new reference, two points and their distance, is kept with the photo when the case is saved.
    await panel.getByRole("radio", { name: /Two points and their distance/ }).check();
    await panel.getByLabel(/Measured distance between the two points/).fill("79.2");
    for (const stud of [STUDS[0], STUDS[2]]) await clickPhotoPixel(surface, stud, PHOTO_SIZE);
    await expect.poll(() => textOf(page.getByText(/^(Unsaved changes|No unsaved changes)$/))).toBe("Unsaved changes");
    await page.getByRole("button", { name: "Save changes" }).click();
    await expect.poll(() => textOf(page.getByRole("status").filter({ hasText: /^Saved “/ }))).toBe(`Saved “${name}”.`);
    const again = await photosOf(saved!.id);
    expect(again).toHaveLength(1);
    expect(again[0].reference).toMatchObject({ kind: "scale", distanceMm: 79.2 });
  });

  it("that cannot be uploaded leaves the case saved, and its form says the photo was not kept and why", async () => {
    const name = `Photo case unkept ${uid}`;
    await newCaseForm(name);
    await chooseAndRefer(await openPhotoPanel(page));
    // The object store is out of reach for this page: the upload's PUT never gets through.
    await page.route(/\/borewright-photos\//, (route) => (route.request().method() === "PUT" ? route.abort("connectionrefused") : route.fallback()));
    await page.getByRole("button", { name: "Create" }).click();
    await page.waitForURL(/\/library\/cases\/[^/?]+$/);
    await expect.poll(() => textOf(page.getByRole("alert").filter({ hasText: "the photo was not kept" }))).toMatch(
      new RegExp(`^Saved “${name}”, but the photo was not kept: The photo store could not be reached\\.`),
    );
    await page.unroute(/\/borewright-photos\//);
    const saved = await caseNamed(name);
    expect(saved).toBeDefined();
    expect((await photosOf(saved!.id)).filter((p) => p.state === "ready")).toEqual([]);
  });
});

describe("the crank chamber lengths", () => {
  it("are all or nothing: two of three filled is refused next to the missing one, and nothing typed is lost", async () => {
    const name = `Crank case ${uid}`;
    await newCaseForm(name);
    const line = page.getByTestId("case-crank-line");
    expect(await line.innerText()).toMatch(/^Crank chamber not given/);
    await page.locator("#f-crank-deckToAxisMm").fill("60");
    await page.locator("#f-crank-webRadiusMm").fill("30");
    await page.getByRole("button", { name: "Create" }).click();
    await expect.poll(() => textOf(page.locator("#f-crank-webSpanMm-error"))).toBe("fill in all three crank chamber lengths, or leave all three empty");
    expect(await page.locator("#f-crank-webSpanMm").getAttribute("aria-invalid")).toBe("true");
    expect(await page.locator("#f-crank-deckToAxisMm-error").count()).toBe(0);
    expect(await page.locator("#f-crank-deckToAxisMm").inputValue()).toBe("60");
    expect(await caseNamed(name)).toBeUndefined();

    // A length that is no number is refused at its own field.
    await page.locator("#f-crank-webSpanMm").fill("eighty");
    await expect.poll(() => textOf(page.locator("#f-crank-webSpanMm-error"))).not.toMatch(/all three/);
    await expect.poll(() => page.locator("#f-crank-webSpanMm-error").count()).toBe(1);

    await page.locator("#f-crank-webSpanMm").fill("80");
    await expect.poll(() => page.locator("#f-crank-webSpanMm-error").count()).toBe(0);
    await expect.poll(() => line.innerText()).toMatch(/^Crank chamber: axis 60(\.0+)? mm below the deck, webs 30(\.0+)? mm in radius and 80(\.0+)? mm across\.$/);
    await page.getByRole("button", { name: "Create" }).click();
    await page.waitForURL(/\/library\?kind=cases/);
    const saved = await caseNamed(name);
    const row = ok<{ item: { data: { crank?: unknown } } }>(await api.get(`/api/v1/cases/${saved!.id}`));
    expect(row.item.data.crank).toEqual({ deckToAxisMm: 60, webRadiusMm: 30, webSpanMm: 80 });

    // The study of this case shows the crank check with the server's figure, in the shop's units.
    const kit = ok<{ item: { id: string } }>(await api.post("/api/v1/kits", { name: `Crank kit ${uid}`, data: kitData(47, 53.92) }), 201).item;
    const study = ok<{ item: { id: string } }>(await api.post("/api/v1/studies", { name: `Crank study ${uid}`, caseId: saved!.id, kitIds: [kit.id] }), 201).item;
    const { result } = ok<{ result: { kits: { crank: { checked: boolean; clearanceMm: number } }[] } }>(await api.get(`/api/v1/studies/${study.id}/results`));
    expect(result.kits[0].crank.checked).toBe(true);
    await page.goto(`/studies/${study.id}`);
    const results = page.getByTestId("kit-results").first();
    // The page speaks the viewer's units: the same figure in either.
    const label = (["mm", "in"] as const).map((u) => signedLengthLabel(result.kits[0].crank.clearanceMm, u).replace(/[.+]/g, (c) => `\\${c}`)).join("|");
    await expect.poll(() => textOf(results)).toMatch(new RegExp(`Skirt to the crank webs\\s+(${label})`));
  });
});
