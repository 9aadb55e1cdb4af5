import type { Locator, Page } from "playwright-core";
import { expect } from "vitest";
import { project, type Camera, type Mm } from "../../scripts/deck-photo";

/** The text of the first element found, or "(not shown)" while there is none: a short wait, so a poll asks again. */
export async function textOf(found: Locator): Promise<string> {
  return found.first().innerText({ timeout: 1000 }).catch(() => "(not shown)");
}

/**
 * A panel of the case form by its region's name, opened: it may sit in a section that opens on request (its
 * summary reads `opener`), or be on show already.
 */
export async function openRegion(page: Page, opener: string, region: string): Promise<Locator> {
  const summary = page.locator("summary", { hasText: opener });
  await summary.or(page.getByRole("region", { name: region })).first().waitFor();
  if (await summary.count()) await summary.click();
  const panel = page.getByRole("region", { name: region });
  await panel.waitFor();
  return panel;
}

/** The case form's photo panel, opened. */
export const openPhotoPanel = (page: Page) => openRegion(page, "Trace over a photo", "Trace from a photo");

/** Where on screen a part of the photo is shown: the share of it the view starts at, across and down, and its zoom. */
export type PhotoView = { zoom: number; left: number; top: number };
const WHOLE_PHOTO: PhotoView = { zoom: 1, left: 0, top: 0 };

/**
 * Clicks a photo trace's surface on a pixel of the photo (`size`, its pixels), once the surface takes clicks,
 * and waits for the point to be placed. A locator click: scrolled into view, and only once the surface stands
 * still and is the one hit at that spot.
 */
export async function clickPhotoPixel(surface: Locator, [x, y]: readonly [number, number], size: { widthPx: number; heightPx: number }, view: PhotoView = WHOLE_PHOTO) {
  await expect.poll(() => surface.getAttribute("data-ready")).toBe("true");
  const before = Number(await surface.getAttribute("data-points"));
  const box = await surface.boundingBox();
  if (!box) throw new Error("the photo is not shown");
  const position = { x: (x / size.widthPx - view.left) * view.zoom * box.width, y: (y / size.heightPx - view.top) * view.zoom * box.height };
  await surface.click({ position });
  await expect.poll(async () => Number(await surface.getAttribute("data-points"))).toBe(before + 1);
}

/** Clicks a photo trace's surface where `camera` put a deck point (mm): {@link clickPhotoPixel} at its pixel. */
export async function clickOnPhoto(surface: Locator, camera: Camera, p: Mm, view?: PhotoView) {
  await clickPhotoPixel(surface, project(camera, p), camera, view);
}
