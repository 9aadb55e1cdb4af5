// Renders the demo case's deck photo: the invented eight-sided two-stroke case of Quillfern Engine Works,
// photographed a little off square, and the same deck as a DXF drawing (as a customer might send it).
// Run: npx tsx scripts/render-demo-case-photo.ts
import { writeFileSync, mkdirSync } from "node:fs";
import Drawing from "dxf-writer";
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

/** The demo deck as a DXF in mm: a closed polyline, circles for the mouth and studs, arcs and lines for the passages. */
export function demoCaseDxf(): string {
  const d = new Drawing();
  d.setUnits("Millimeters");
  d.addLayer("DECK", Drawing.ACI.WHITE, "CONTINUOUS").setActiveLayer("DECK");
  d.drawPolyline(DEMO_CASE.deck, true);
  d.addLayer("MOUTH", Drawing.ACI.RED, "CONTINUOUS").setActiveLayer("MOUTH");
  d.drawCircle(0, 0, 31);
  d.addLayer("STUDS", Drawing.ACI.BLUE, "CONTINUOUS").setActiveLayer("STUDS");
  for (const s of DEMO_CASE.studs) d.drawCircle(s.at[0], s.at[1], s.diameterMm / 2);
  d.addLayer("PASSAGES", Drawing.ACI.GREEN, "CONTINUOUS").setActiveLayer("PASSAGES");
  for (const centre of [0, 180]) {
    const a0 = centre - 22;
    const a1 = centre + 22;
    const at = (r: number, deg: number) => [r * Math.cos((deg * Math.PI) / 180), r * Math.sin((deg * Math.PI) / 180)];
    d.drawArc(0, 0, 38, (a0 + 360) % 360, (a1 + 360) % 360);
    d.drawArc(0, 0, 31, (a0 + 360) % 360, (a1 + 360) % 360);
    const [p, q] = [at(31, a0), at(38, a0)];
    const [r, t] = [at(31, a1), at(38, a1)];
    d.drawLine(p[0], p[1], q[0], q[1]);
    d.drawLine(r[0], r[1], t[0], t[1]);
  }
  return d.toDxfString();
}

async function main() {
  const browser = await chromium.launch({ executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium", args: CHROMIUM_ARGS });
  try {
    const page = await browser.newPage();
    const jpeg = await renderDeckPhoto(page, DEMO_CAMERA, DEMO_CASE, "image/jpeg", 0.8);
    mkdirSync("public/demo", { recursive: true });
    writeFileSync("public/demo/eight-sided-case-deck.jpg", jpeg);
    console.log(`public/demo/eight-sided-case-deck.jpg: ${(jpeg.length / 1024).toFixed(0)} KB`);
    writeFileSync("public/demo/eight-sided-case-deck.dxf", demoCaseDxf());
  } finally {
    await browser.close();
  }
}

if (process.argv[1]?.endsWith("render-demo-case-photo.ts")) void main();
