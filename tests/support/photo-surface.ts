import type { Locator } from "playwright-core";
import { expect } from "vitest";
import { project, type Camera, type Mm } from "../../scripts/deck-photo";

/** The text of the first element found, or "(not shown)" while there is none: a short wait, so a poll asks again. */
export async function textOf(found: Locator): Promise<string> {
  return found.first().innerText({ timeout: 1000 }).catch(() => "(not shown)");
}

/**
 * Clicks a photo trace's surface where `camera` put a deck point (mm), once the surface takes clicks, and waits
 * for the point to be placed. A locator click: scrolled into view, and only once the surface stands still and
 * is the one hit at that spot.
 */
export async function clickOnPhoto(surface: Locator, camera: Camera, p: Mm) {
  await expect.poll(() => surface.getAttribute("data-ready")).toBe("true");
  const before = Number(await surface.getAttribute("data-points"));
  const box = await surface.boundingBox();
  if (!box) throw new Error("the photo is not shown");
  const [x, y] = project(camera, p);
  await surface.click({ position: { x: (x / camera.widthPx) * box.width, y: (y / camera.heightPx) * box.height } });
  await expect.poll(async () => Number(await surface.getAttribute("data-points"))).toBe(before + 1);
}
