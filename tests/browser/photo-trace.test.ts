// Tracing a case from a photo in Chromium: the test paints a known eight-sided deck with four studs at a known
// spacing, seen by a tilted pinhole camera, uploads it to a case profile, clicks the four studs and the deck's
// corners at the pixels the same camera puts them, and checks the traced outline against the truth.
import { createRequire } from "node:module";
import type { Browser, BrowserContext, Locator, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { chamferedDeck, circle, project, renderDeckPhoto, type Camera, type DeckScene, type Mm } from "../../scripts/deck-photo";
import { closeBrowser, collectPageErrors, launchSignedIn, screenshot } from "../support/browser";
import { DEMO, signIn, type Http } from "../support/http";
import { clickOnPhoto, openPhotoPanel, openRegion, textOf } from "../support/photo-surface";
import { newCase, ok } from "../integration/library-fixtures";
import { demoCaseDxf } from "../../scripts/render-demo-case-photo";

const DECK = chamferedDeck(110, 100, 18);
const STUDS: Mm[] = [[-28, -28], [28, -28], [28, 28], [-28, 28]];
const SCENE: DeckScene = { deck: DECK, mouth: circle([0, 0], 62), passages: [], studs: STUDS.map((at) => ({ at, diameterMm: 8.5 })) };
// Tilted 16° and 7° off square and turned 4°: a phone held by hand over the bench.
const CAMERA: Camera = { widthPx: 1200, heightPx: 900, focalPx: 1500, tiltXDeg: 16, tiltYDeg: 7, turnDeg: 4, distanceMm: 220 };

let browser: Browser;
let context: BrowserContext;
let page: Page;
let api: Http;
let caseId: string;
const pageErrors: string[] = [];

beforeAll(async () => {
  api = await signIn(DEMO.owner.email, DEMO.owner.password);
  caseId = (await newCase(api)).id;
  ({ browser, context, page } = await launchSignedIn(DEMO.owner, { width: 1500, height: 1900, pageErrors }));
});

afterAll(() => closeBrowser(browser, pageErrors));

async function photos(): Promise<{ id: string; state: string; widthPx: number | null; heightPx: number | null }[]> {
  return ok<{ items: { id: string; state: string; widthPx: number | null; heightPx: number | null }[] }>(await api.get(`/api/v1/cases/${caseId}/photos`)).items;
}

/** The case profile's form with its photo panel open. */
async function openPanel(): Promise<Locator> {
  await page.goto(`/library/cases/${caseId}`);
  return openPhotoPanel(page);
}

/**
 * The case profile's photo panel in a tab of its own, with the reference set to four studs 56 mm apart each way
 * and the kept photo on show. A new tab: the last one holds unsaved changes, which the form guards when leaving.
 */
async function panelInNewTab(): Promise<{ panel: Locator; surface: Locator }> {
  await page.close();
  page = await context.newPage();
  collectPageErrors(page, pageErrors);
  const panel = await openPanel();
  // The kept photo comes back with the case profile.
  const surface = panel.getByTestId("trace-surface");
  await expect.poll(() => surface.locator("canvas").evaluate((c: HTMLCanvasElement) => c.width)).toBe(1200);
  return { panel, surface };
}

/** Types the measured stud spacing, 56 mm each way, in the units the panel's fields are in. */
async function typeStudSpacing(panel: Locator) {
  await panel.getByLabel(/Stud spacing across/).fill(await lengthFor(panel, /Stud spacing across/, 56));
  await panel.getByLabel(/Stud spacing along/).fill(await lengthFor(panel, /Stud spacing along/, 56));
}

/** Serious or critical accessibility violations inside one region, by axe-core's rules. */
async function axeViolations(selector: string): Promise<string[]> {
  await page.addScriptTag({ path: createRequire(import.meta.url).resolve("axe-core/axe.min.js") });
  return page.evaluate(
    (sel) =>
      (window as unknown as { axe: { run: (ctx: string) => Promise<{ violations: { id: string; impact: string | null; help: string; nodes: { target: string[] }[] }[] }> } }).axe
        .run(sel)
        .then((r) => r.violations.filter((v) => v.impact === "serious" || v.impact === "critical").map((v) => `${v.id}: ${v.help} (${v.nodes.map((n) => n.target.join(" ")).join("; ")})`)),
    selector,
  );
}

/** A length as the field wants it: mm as typed, or inches when the form is in inches. */
async function lengthFor(panel: Locator, label: RegExp, mm: number): Promise<string> {
  const text = await panel.getByText(label).first().innerText();
  return /\(in\)/.test(text) ? (mm / 25.4).toFixed(5) : String(mm);
}

describe("trace a deck from a photo", () => {
  it("squares up a tilted photo from four studs and traces the deck within 0.2 mm", async () => {
    const painter = await context.newPage();
    const png = await renderDeckPhoto(painter, CAMERA, SCENE, "image/png");
    await painter.close();

    const panel = await openPanel();

    // Not an image: refused in words, and nothing kept.
    await panel.getByLabel(/Photo of the deck/).setInputFiles({ name: "deck.png", mimeType: "image/png", buffer: Buffer.from("these are notes, not a photo") });
    await expect.poll(() => textOf(panel.getByRole("alert"))).toMatch(/not a JPEG, PNG or WebP image.*Nothing was saved\./);
    expect(await photos()).toEqual([]);

    await panel.getByLabel(/Photo of the deck/).setInputFiles({ name: "deck.png", mimeType: "image/png", buffer: png });
    await expect.poll(() => textOf(panel.getByRole("status"))).toMatch(/Photo kept with the case profile/);
    const kept = await photos();
    expect(kept).toHaveLength(1);
    expect(kept[0]).toMatchObject({ state: "ready", widthPx: 1200, heightPx: 900 });

    const surface = panel.getByTestId("trace-surface");
    // The photo is drawn under the trace: dark in the mouth, light on the deck face (red channel, 0–255).
    const [inMouth, onFace] = await surface.locator("canvas").evaluate(
      (c: HTMLCanvasElement, pts) => pts.map(([x, y]) => c.getContext("2d")!.getImageData(Math.round((x * c.width) / 1200), Math.round((y * c.height) / 900), 1, 1).data[0]),
      [project(CAMERA, [0, 0]), project(CAMERA, [45, 0])],
    );
    expect(inMouth).toBeLessThan(60);
    expect(onFace).toBeGreaterThan(140);

    await typeStudSpacing(panel);
    // The studs in an order of their own: the panel sorts them into the rectangle's corners.
    for (const s of [STUDS[2], STUDS[0], STUDS[1], STUDS[3]]) await clickOnPhoto(surface, CAMERA, s);
    await expect.poll(() => textOf(panel.getByTestId("trace-fit"))).toMatch(/^The four points fit a 56(\.0+)? mm × 56(\.0+)? mm rectangle within 0\.\d+ mm\.$|^The four points fit a 2\.205 in × 2\.205 in rectangle within/);

    await panel.getByRole("button", { name: "Deck", exact: true }).click();
    for (const corner of DECK) await clickOnPhoto(surface, CAMERA, corner);
    await expect.poll(() => textOf(panel.getByTestId("trace-prompt"))).toMatch(/Deck corners/);

    const readout = panel.getByTestId("trace-readout");
    await expect.poll(async () => JSON.parse((await readout.getAttribute("data-shapes")) ?? "{}").deck?.pointsMm?.length ?? 0).toBe(8);
    const shapes = JSON.parse((await readout.getAttribute("data-shapes")) ?? "{}") as { deck: { kind: string; pointsMm: Mm[] }; studs: { label: string; positionMm: Mm }[] };
    expect(shapes.deck.kind).toBe("polygon");
    const deckErrors = shapes.deck.pointsMm.map((p, i) => Math.hypot(p[0] - DECK[i][0], p[1] - DECK[i][1]));
    const studErrors = STUDS.map((s) => Math.min(...shapes.studs.map((t) => Math.hypot(t.positionMm[0] - s[0], t.positionMm[1] - s[1]))));
    console.log(`photo trace: worst deck corner off by ${Math.max(...deckErrors).toFixed(3)} mm, worst stud by ${Math.max(...studErrors).toFixed(3)} mm`);
    expect(Math.max(...deckErrors)).toBeLessThanOrEqual(0.2);
    expect(shapes.studs).toHaveLength(4);
    expect(Math.max(...studErrors)).toBeLessThanOrEqual(0.2);

    await panel.getByRole("button", { name: "Put the traced shapes into the form" }).click();
    await expect.poll(() => textOf(panel.getByText(/^Put into the form:/))).toBe("Put into the form: the deck, 4 studs.");
    await screenshot(page, "photo-trace");
    expect(await axeViolations('[aria-label="Trace from a photo"]')).toEqual([]);
  });

  it("refuses reference points that coincide, saying so next to the fields", async () => {
    const { panel, surface } = await panelInNewTab();
    await typeStudSpacing(panel);
    for (const s of [STUDS[0], STUDS[1], STUDS[1], STUDS[2]]) await clickOnPhoto(surface, CAMERA, s);
    await expect.poll(() => textOf(panel.getByRole("alert"))).toMatch(/are on the same spot/);
    await expect.poll(() => panel.getByRole("button", { name: "Put the traced shapes into the form" }).isDisabled()).toBe(true);
  });

  it("places each point on the photo's pixel under the pointer when the photo is zoomed in", async () => {
    const { panel, surface } = await panelInNewTab();
    await panel.getByRole("button", { name: "Start over" }).click();
    await panel.getByLabel(/Four studs of a measured pattern/).check();
    await typeStudSpacing(panel);
    // + zooms in one step of 1.5 about the middle: the window shown starts at 0.5 − 0.5 / 1.5 of the photo
    // across and down, and is 1 / 1.5 of it wide and tall.
    await surface.focus();
    await page.keyboard.press("+");
    await expect.poll(() => surface.getAttribute("data-zoom")).toBe("1.5");
    const zoom = 1.5, left = 0.5 - 0.5 / zoom;
    for (const p of STUDS) await clickOnPhoto(surface, CAMERA, p, { zoom, left, top: left });
    await expect.poll(() => textOf(panel.getByTestId("trace-fit"))).toMatch(/^The four points fit a (56(\.0+)? mm × 56(\.0+)? mm|2\.205 in × 2\.205 in) rectangle within/);
    const readout = panel.getByTestId("trace-readout");
    await expect.poll(async () => JSON.parse((await readout.getAttribute("data-shapes")) ?? "{}").studs?.length ?? 0).toBe(4);
    const shapes = JSON.parse((await readout.getAttribute("data-shapes")) ?? "{}") as { studs: { positionMm: Mm }[] };
    const studErrors = STUDS.map((s) => Math.min(...shapes.studs.map((t) => Math.hypot(t.positionMm[0] - s[0], t.positionMm[1] - s[1]))));
    expect(Math.max(...studErrors)).toBeLessThanOrEqual(0.2);
    // 0 shows the whole photo again.
    await surface.focus();
    await page.keyboard.press("0");
    await expect.poll(() => surface.getAttribute("data-zoom")).toBe("1");
  });

  it("imports the same deck from a DXF drawing, each shape picked by its layer", async () => {
    await page.goto(`/library/cases/${caseId}`);
    const panel = await openRegion(page, "Import a drawing", "Import a drawing");

    await panel.getByLabel(/^Drawing \(DXF or SVG/).setInputFiles({ name: "empty.dxf", mimeType: "application/dxf", buffer: Buffer.from("") });
    await expect.poll(() => textOf(panel.getByRole("alert"))).toBe("The file is empty. Nothing was put into the form.");

    await panel.getByLabel(/^Drawing \(DXF or SVG/).setInputFiles({ name: "eight-sided-case-deck.dxf", mimeType: "application/dxf", buffer: Buffer.from(demoCaseDxf()) });
    const rows = panel.getByRole("table", { name: "Which shape is which" }).locator("tbody tr");
    await expect.poll(() => rows.count()).toBe(8);
    await expect.poll(() => panel.getByLabel(/What shape 1 \(closed polyline on layer DECK/).inputValue()).toBe("deck");
    expect(await panel.getByLabel(/What shape 2 \(circle on layer MOUTH/).inputValue()).toBe("mouth");
    await panel.getByRole("button", { name: "Put the shapes into the form" }).click();
    await expect.poll(() => textOf(panel.getByRole("status"))).toBe("Put into the form: the deck, the mouth, 4 studs, 2 passages.");
    expect(await axeViolations('[aria-label="Import a drawing"]')).toEqual([]);
  });

  it("turns a photo upright by its EXIF orientation before tracing", async () => {
    const painter = await context.newPage();
    const jpeg = await renderDeckPhoto(painter, CAMERA, SCENE, "image/jpeg", 0.8);
    await painter.close();
    // An APP1 segment right after the JPEG's start marker: "Exif", a big-endian TIFF header and one IFD entry,
    // Orientation (tag 0x0112, SHORT) = 6, "rotate 90° clockwise to view" (CIPA DC-008 Exif 2.32, §4.6.4 A).
    const tiff = Buffer.from([0x4d, 0x4d, 0x00, 0x2a, 0x00, 0x00, 0x00, 0x08, 0x00, 0x01, 0x01, 0x12, 0x00, 0x03, 0x00, 0x00, 0x00, 0x01, 0x00, 0x06, 0x00, 0x00, 0x00, 0x00, 0x00, 0x00]);
    const body = Buffer.concat([Buffer.from("Exif\0\0", "latin1"), tiff]);
    const app1 = Buffer.concat([Buffer.from([0xff, 0xe1, (body.length + 2) >> 8, (body.length + 2) & 0xff]), body]);
    const turned = Buffer.concat([jpeg.subarray(0, 2), app1, jpeg.subarray(2)]);

    const panel = await openPanel();
    await panel.getByLabel(/Photo of the deck/).setInputFiles({ name: "deck-turned.jpg", mimeType: "image/jpeg", buffer: turned });
    await expect.poll(() => textOf(panel.getByRole("status"))).toMatch(/Photo kept with the case profile/);
    // Upright, the 1200 × 900 picture stored on its side is 900 wide and 1200 tall. The status speaks only once
    // the new photo is on show, so the surface already shows it and takes clicks.
    const surface = panel.getByTestId("trace-surface");
    expect([await surface.getAttribute("data-photo-width"), await surface.getAttribute("data-photo-height"), await surface.getAttribute("data-ready")]).toEqual(["900", "1200", "true"]);
    expect((await photos())[0]).toMatchObject({ state: "ready", widthPx: 900, heightPx: 1200 });
  });
});
