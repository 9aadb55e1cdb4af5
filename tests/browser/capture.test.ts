// Entering a case profile from measurements in Chromium, with the plan at the deck drawn beside the
// fields: a stud pattern from its centre distances, a chamfered deck, an arc-slot passage; a corner
// dragged, undone, redone; the passage mirrored. The numbers in the fields and the points of the drawing
// agree at every step, and the saved row holds them.
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it, inject } from "vitest";
import { INK } from "@/scene/drawing/svg";
import { closeBrowser, launchSignedIn, screenshot } from "../support/browser";
import { DEMO } from "../support/http";
import { openNewForm } from "../support/library-forms";

const NAME = `Traced case ${Date.now().toString(36)}`;

let browser: Browser;
let page: Page;
const pageErrors: string[] = [];

type Pt = [number, number];

/** The corners of an outline as its fields hold them. */
async function fieldCorners(p: Page, label: string): Promise<Pt[]> {
  const rows = p.getByRole("list", { name: `${label} corners` }).getByRole("listitem");
  const out: Pt[] = [];
  for (let i = 0; i < (await rows.count()); i++) {
    const x = await p.getByLabel(`${label} corner ${i + 1} x (mm)`, { exact: true }).inputValue();
    const y = await p.getByLabel(`${label} corner ${i + 1} y (mm)`, { exact: true }).inputValue();
    out.push([Number(x), Number(y)]);
  }
  return out;
}

/** The corners of a shape as drawn: each handle's centre in the SVG (y down), turned back into the core's frame (y up). */
async function drawnCorners(p: Page, shape: string): Promise<Pt[]> {
  return p.getByTestId("shape-plan").evaluate((host, key) => {
    const els = [...host.querySelectorAll<SVGCircleElement>(`[data-kind="corner"]`)].filter((e) => e.dataset.key?.startsWith(`${key}:`));
    els.sort((a, b) => Number(a.dataset.key?.split(":")[1]) - Number(b.dataset.key?.split(":")[1]));
    return els.map((e) => [Number(e.getAttribute("cx")), -Number(e.getAttribute("cy"))] as [number, number]);
  }, shape);
}

async function expectAgree(p: Page, label: string, shape: string) {
  const fields = await fieldCorners(p, label);
  const drawn = await drawnCorners(p, shape);
  expect(drawn).toHaveLength(fields.length);
  drawn.forEach((d, i) => {
    expect(d[0]).toBeCloseTo(fields[i][0], 3);
    expect(d[1]).toBeCloseTo(fields[i][1], 3);
  });
  return fields;
}

async function measure(p: Page, what: string, shape: string | null, values: Record<string, string>) {
  const panel = p.locator("details", { hasText: `Draw the ${what.toLowerCase()} from measurements` }).first();
  if (!(await panel.evaluate((d) => (d as HTMLDetailsElement).open))) await panel.locator("summary").click();
  if (shape) await p.getByLabel(`${what.toLowerCase()} drawn as`).selectOption({ label: shape });
  for (const [label, v] of Object.entries(values)) await p.getByLabel(`${what.toLowerCase()}: ${label}`).fill(v);
  await p.getByRole("button", { name: `Draw the ${what.toLowerCase()}`, exact: true }).click();
}

beforeAll(async () => {
  ({ browser, page } = await launchSignedIn(DEMO.builder, { width: 1600, height: 1100, pageErrors }));
  await page.waitForURL(/\/home/);
});

afterAll(() => closeBrowser(browser, pageErrors));

describe("a case profile entered from measurements, on its drawing", () => {
  it("builds, drags, undoes, redoes, mirrors and saves what the drawing shows", async () => {
    await openNewForm(page, "cases", NAME);
    await page.locator("#f-mouthReadingsMm-0").fill("46");
    await page.locator("#f-mouth-depthMm").fill("26");
    await page.locator("#f-studHoleDiameterMm").fill("7.5");
    await page.locator("#f-stockBoreMm").fill("40");
    await page.locator("#f-strokeMm").fill("39.2");

    // Studs from the centre distances read with calipers: 56 across, 48 along → (±28, ±24).
    await measure(page, "Stud pattern", "Rectangular pattern", { "Centre distance across (x) (mm)": "56", "Centre distance along (y) (mm)": "48" });
    await expect.poll(() => page.getByLabel("Stud 2 x (mm)").inputValue()).toBe("28");
    expect(await page.getByLabel("Stud 2 y (mm)").inputValue()).toBe("24");
    const stud2 = page.getByTestId("shape-plan").locator('[data-key="studs.1"][data-kind="stud"]');
    expect(Number(await stud2.getAttribute("cx"))).toBeCloseTo(28, 6);
    expect(Number(await stud2.getAttribute("cy"))).toBeCloseTo(-24, 6);

    // A 110 × 100 deck with 12 mm chamfers: eight corners, the first at (55, −38).
    await page.getByRole("radiogroup", { name: "Deck shape" }).getByLabel("Polygon (corners)").check();
    await measure(page, "Deck", "Rectangle, chamfered corners", { "Width (x) (mm)": "110", "Length (y) (mm)": "100", "Chamfer along each side (mm)": "12" });
    await expect.poll(async () => (await fieldCorners(page, "Deck")).length).toBe(8);
    const deck = await expectAgree(page, "Deck", "deck");
    expect(deck[0]).toEqual([55, -38]);
    expect(deck[1]).toEqual([55, 38]);

    // An arc-slot passage 26–34 mm, 40° about +x: its first corner at 34·(cos −20°, sin −20°).
    await page.getByRole("button", { name: "Add a passage" }).click();
    await measure(page, "Passage 1", "Arc slot around the bore", { "Inner radius (mm)": "26", "Outer radius (mm)": "34", "Angular span (°)": "40", "Centre angle from +x (°)": "0" });
    await expect.poll(async () => (await fieldCorners(page, "Passage 1")).length).toBeGreaterThan(8);
    const slot = await expectAgree(page, "Passage 1", "pockets.0");
    expect(slot[0][0]).toBeCloseTo(34 * Math.cos((-20 * Math.PI) / 180), 3);
    expect(slot[0][1]).toBeCloseTo(34 * Math.sin((-20 * Math.PI) / 180), 3);
    await expect.poll(() => page.getByTestId("shape-issues").count()).toBe(0);

    // A stud typed inside the mouth is drawn in the warning colour and named in words; two undos put it back.
    const plan = page.getByRole("region", { name: "Plan at the deck" });
    await page.getByLabel("Stud 1 x (mm)").fill("5");
    await page.getByLabel("Stud 1 y (mm)").fill("5");
    await expect.poll(() => page.getByTestId("shape-issues").innerText()).toContain("stud 1 is inside the mouth");
    expect(await page.getByTestId("shape-plan").locator('circle[data-key="studs.0"]').first().getAttribute("stroke")).toBe(INK.interfere);
    await plan.getByRole("button", { name: "Undo" }).click();
    await plan.getByRole("button", { name: "Undo" }).click();
    await expect.poll(() => page.getByLabel("Stud 1 x (mm)").inputValue()).toBe("-28");
    await expect.poll(() => page.getByTestId("shape-issues").count()).toBe(0);

    // Drag deck corner 2 (55, 38) 40 px right and 30 px up; it lands on the 0.1 mm grid where the pointer went.
    const handle = page.getByTestId("shape-plan").locator('[data-key="deck:1"]');
    await handle.scrollIntoViewIfNeeded();
    const box = await handle.boundingBox();
    if (!box) throw new Error("deck corner 2 is not drawn");
    const from = { x: box.x + box.width / 2, y: box.y + box.height / 2 };
    const to = { x: from.x + 40, y: from.y - 30 };
    const expected = await page.getByTestId("shape-plan").evaluate((host, [fx, fy, tx, ty]) => {
      const m = host.querySelector("svg")?.getScreenCTM()?.inverse();
      if (!m) throw new Error("no drawing");
      const a = new DOMPoint(fx, fy).matrixTransform(m), b = new DOMPoint(tx, ty).matrixTransform(m);
      return [55 + (b.x - a.x), 38 - (b.y - a.y)];
    }, [from.x, from.y, to.x, to.y]);
    await page.mouse.move(from.x, from.y);
    await page.mouse.down();
    for (let i = 1; i <= 8; i++) await page.mouse.move(from.x + (40 * i) / 8, from.y - (30 * i) / 8);
    await page.mouse.up();
    await expect.poll(async () => (await fieldCorners(page, "Deck"))[1][0]).not.toBe(55);
    const dragged = (await expectAgree(page, "Deck", "deck"))[1];
    expect(Math.abs(dragged[0] - expected[0])).toBeLessThanOrEqual(0.05 + 1e-9);
    expect(Math.abs(dragged[1] - expected[1])).toBeLessThanOrEqual(0.05 + 1e-9);
    expect(Math.round(dragged[0] * 10) / 10).toBeCloseTo(dragged[0], 9);
    await screenshot(page, "capture-dragged");

    // Undo puts the corner back; redo (Ctrl+Shift+Z on the drawing) brings the drag back.
    await plan.getByRole("button", { name: "Undo" }).click();
    await expect.poll(async () => (await fieldCorners(page, "Deck"))[1]).toEqual([55, 38]);
    expect((await expectAgree(page, "Deck", "deck"))[1]).toEqual([55, 38]);
    await plan.getByRole("button", { name: "Undo" }).focus();
    await page.keyboard.press("Control+Shift+Z");
    await expect.poll(async () => (await fieldCorners(page, "Deck"))[1]).toEqual(dragged);
    expect((await expectAgree(page, "Deck", "deck"))[1]).toEqual(dragged);

    // The arrow keys nudge the focused point by one grid step.
    await page.getByTestId("shape-plan").locator('[data-key="deck:0"]').focus();
    await page.keyboard.press("ArrowUp");
    await expect.poll(async () => (await fieldCorners(page, "Deck"))[0]).toEqual([55, -37.9]);

    // Zoomed in with the wheel over deck corner 2, about that corner: the scale on screen is read from two
    // handles' distance apart and their fields, not from the drawing's own transform.
    const scale = async () => {
      const [a, b] = [await page.getByTestId("shape-plan").locator('[data-key="deck:0"]').boundingBox(), await page.getByTestId("shape-plan").locator('[data-key="deck:4"]').boundingBox()];
      if (!a || !b) throw new Error("deck corners 1 and 5 are not drawn");
      const [p0, p4] = [(await fieldCorners(page, "Deck"))[0], (await fieldCorners(page, "Deck"))[4]];
      return Math.hypot(b.x + b.width / 2 - (a.x + a.width / 2), b.y + b.height / 2 - (a.y + a.height / 2)) / Math.hypot(p4[0] - p0[0], p4[1] - p0[1]);
    };
    const fitScale = await scale();
    const corner2 = page.getByTestId("shape-plan").locator('[data-key="deck:1"]');
    const c2 = await corner2.boundingBox();
    if (!c2) throw new Error("deck corner 2 is not drawn");
    await page.mouse.move(c2.x + c2.width / 2, c2.y + c2.height / 2);
    await page.mouse.wheel(0, -400);
    await expect.poll(async () => (await scale()) / fitScale).toBeGreaterThan(1.5);
    const zoomed = await scale();
    // Under the pointer it zoomed about, corner 2 is still on screen within the plan.
    const z = await corner2.boundingBox();
    const planBox = await page.getByTestId("shape-plan").boundingBox();
    if (!z || !planBox) throw new Error("deck corner 2 is not drawn after zooming");
    expect(z.x).toBeGreaterThan(planBox.x);
    expect(z.x + z.width).toBeLessThan(planBox.x + planBox.width);
    expect(Math.abs(z.x + z.width / 2 - (c2.x + c2.width / 2))).toBeLessThan(2);
    expect(zoomed / fitScale).toBeGreaterThan(1.5);
    // Zoomed in, the same corner dragged a second time, after the pointer has passed over another point on
    // its way (a hover redraws the plan): it lands where the pointer went at the zoomed scale, 20 px left
    // and 10 px down being 20 and 10 px over the scale read above, on the 0.1 mm grid.
    const before2 = (await fieldCorners(page, "Deck"))[1];
    const c1 = await page.getByTestId("shape-plan").locator('[data-key="deck:0"]').boundingBox();
    if (!c1) throw new Error("deck corner 1 is not drawn after zooming");
    await page.mouse.move(c1.x + c1.width / 2, c1.y + c1.height / 2, { steps: 4 });
    const z0 = { x: z.x + z.width / 2, y: z.y + z.height / 2 };
    await page.mouse.move(z0.x, z0.y, { steps: 4 });
    await page.mouse.down();
    for (let i = 1; i <= 8; i++) await page.mouse.move(z0.x - (20 * i) / 8, z0.y + (10 * i) / 8);
    await page.mouse.up();
    await expect.poll(async () => (await fieldCorners(page, "Deck"))[1]).not.toEqual(before2);
    const after2 = (await expectAgree(page, "Deck", "deck"))[1];
    expect(Math.abs(after2[0] - (before2[0] - 20 / zoomed))).toBeLessThanOrEqual(0.05 + 1e-9);
    expect(Math.abs(after2[1] - (before2[1] - 10 / zoomed))).toBeLessThanOrEqual(0.05 + 1e-9);
    // Undone, the corner is back (and the frame the fit is measured against with it).
    await plan.getByRole("button", { name: "Undo" }).click();
    await expect.poll(async () => (await fieldCorners(page, "Deck"))[1]).toEqual(before2);
    // The keys: 0 fits the whole plan again, + zooms in one step of 1.5, the button zooms back out.
    await page.getByTestId("shape-plan").locator('[data-key="deck:0"]').focus();
    await page.keyboard.press("0");
    await expect.poll(async () => (await scale()) / fitScale).toBeCloseTo(1, 2);
    await page.keyboard.press("+");
    await expect.poll(async () => (await scale()) / fitScale).toBeCloseTo(1.5, 2);
    await page.getByRole("button", { name: "Zoom out of the plan" }).click();
    await expect.poll(async () => (await scale()) / fitScale).toBeCloseTo(1, 2);

    // The passage mirrored to the other side: a copy across the y axis, (x, y) → (−x, y), in reverse order.
    await page.getByRole("button", { name: "Add a copy of Passage 1 mirrored across the y axis" }).click();
    await expect.poll(async () => (await fieldCorners(page, "Passage 2")).length).toBe(slot.length);
    const mirrored = await expectAgree(page, "Passage 2", "pockets.1");
    mirrored.forEach((p, i) => {
      const q = slot[slot.length - 1 - i];
      expect(p[0]).toBeCloseTo(-q[0], 3);
      expect(p[1]).toBeCloseTo(q[1], 3);
    });
    await screenshot(page, "capture-mirrored");

    // Saved, the row holds the same numbers, and the measurements the shapes were drawn from.
    const finalDeck = await fieldCorners(page, "Deck");
    await page.getByRole("button", { name: "Create" }).click();
    await page.waitForURL(/\/library\?kind=cases/);
    const res = await page.request.get(`${inject("baseURL")}/api/v1/cases?q=${encodeURIComponent(NAME)}`);
    expect(res.status()).toBe(200);
    const body = (await res.json()) as { items: { name: string; data: { deck: { pointsMm: Pt[] }; pockets: { outline: { pointsMm: Pt[] } }[]; studs: { positionMm: Pt }[]; capture?: Record<string, { kind: string }> } }[] };
    const row = body.items.find((r) => r.name === NAME);
    if (!row) throw new Error("the saved case is not in the list");
    expect(row.data.deck.pointsMm).toEqual(finalDeck);
    expect(row.data.pockets).toHaveLength(2);
    expect(row.data.pockets[1].outline.pointsMm).toEqual(mirrored);
    expect(row.data.studs.map((s) => s.positionMm)).toEqual([[-28, 24], [28, 24], [28, -24], [-28, -24]]);
    // The deck was edited by hand after it was drawn, so only the stud pattern and the passage keep their measurements.
    expect(row.data.capture?.studs?.kind).toBe("rect-studs");
    expect(row.data.capture?.["pockets.0"]?.kind).toBe("arc-slot");
    expect(row.data.capture?.deck).toBeUndefined();
  });

  it("a kit's base gasket gets its port windows the same way, drawn over the bore, and saves them", async () => {
    const kit = `Gasket kit ${Date.now().toString(36)}`;
    await openNewForm(page, "kits", kit);
    await page.locator("#f-boreMm").fill("47");
    await page.locator("#f-skirtDiameterReadingsMm-0").fill("53.9");
    await page.locator("#f-skirtLengthReadingsMm-0").fill("24.6");
    await page.getByRole("button", { name: "Add a stud" }).click();
    await page.getByLabel("Stud 1 x (mm)").fill("28");
    await page.getByLabel("Stud 1 y (mm)").fill("28");
    await page.getByRole("button", { name: "Add a port" }).click();
    await measure(page, "Port 1", "Rectangle beside the bore", { "Width across (mm)": "14", "Length outwards (mm)": "6", "Near edge from the axis (mm)": "24", "Direction from +x (°)": "90" });
    // Near edge 24 mm out along +y, 14 wide: corners (7, 24), (7, 30), (−7, 30), (−7, 24).
    await expect.poll(async () => (await fieldCorners(page, "Port 1")).length).toBe(4);
    const port = await expectAgree(page, "Port 1", "pockets.0");
    expect(port[0][0]).toBeCloseTo(7, 6);
    expect(port[0][1]).toBeCloseTo(24, 6);
    expect(port[2][0]).toBeCloseTo(-7, 6);
    expect(port[2][1]).toBeCloseTo(30, 6);
    await screenshot(page, "capture-gasket");
    await page.getByRole("button", { name: "Create" }).click();
    await page.waitForURL(/\/library\?kind=kits/);
    const res = await page.request.get(`${inject("baseURL")}/api/v1/kits?q=${encodeURIComponent(kit)}`);
    const body = (await res.json()) as { items: { name: string; data: { baseGasket?: { ports: { label: string; outline: { pointsMm: Pt[] } }[] }; capture?: Record<string, { kind: string }> } }[] };
    const row = body.items.find((r) => r.name === kit);
    expect(row?.data.baseGasket?.ports).toHaveLength(1);
    expect(row?.data.baseGasket?.ports[0].outline.pointsMm).toEqual(port);
    expect(row?.data.capture?.["ports.0"]?.kind).toBe("radial-rect");
  });
});
