// Renders the demo case's deck photo: the invented eight-sided two-stroke case of Quillfern Engine Works,
// photographed a little off square. Run: npx tsx scripts/render-demo-case-photo.ts
import { writeFileSync, mkdirSync } from "node:fs";
import { chromium } from "playwright-core";
import { CHROMIUM_ARGS } from "../tests/support/browser";
import { arcSlot, chamferedDeck, circle, renderDeckPhoto, type Camera, type DeckScene } from "./deck-photo";

/** The demo case: 110 × 100 mm deck with 18 mm chamfers, Ø 62 mm mouth, studs 56 × 56 mm, two transfer passages. */
export const DEMO_CASE: DeckScene = {
  deck: chamferedDeck(110, 100, 18),
  mouth: circle([0, 0], 62),
  passages: [arcSlot(31, 38, 0, 44), arcSlot(31, 38, 180, 44)],
  studs: [[-28, -28], [28, -28], [28, 28], [-28, 28]].map((at) => ({ at: at as [number, number], diameterMm: 8.5 })),
};

export const DEMO_CAMERA: Camera = { widthPx: 1200, heightPx: 900, focalPx: 1500, tiltXDeg: 14, tiltYDeg: -6, turnDeg: 3, distanceMm: 220 };

async function main() {
  const browser = await chromium.launch({ executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium", args: CHROMIUM_ARGS });
  try {
    const page = await browser.newPage();
    const jpeg = await renderDeckPhoto(page, DEMO_CAMERA, DEMO_CASE, "image/jpeg", 0.8);
    mkdirSync("public/demo", { recursive: true });
    writeFileSync("public/demo/eight-sided-case-deck.jpg", jpeg);
    console.log(`public/demo/eight-sided-case-deck.jpg: ${(jpeg.length / 1024).toFixed(0)} KB`);
  } finally {
    await browser.close();
  }
}

if (process.argv[1]?.endsWith("render-demo-case-photo.ts")) void main();
