// A deck photographed by an invented pinhole camera: the shapes of a case's deck (in mm, the case's frame)
// projected into pixels and painted in a browser canvas. Used to render the demo case's photo and by the
// photo-trace browser test, which knows every pixel position from the same projection.
import type { Page } from "playwright-core";

export type Mm = [number, number];

export type Camera = {
  widthPx: number;
  heightPx: number;
  focalPx: number;
  /** Tilt of the camera about the deck's x axis and y axis, and its turn about its own axis, degrees. */
  tiltXDeg: number;
  tiltYDeg: number;
  turnDeg: number;
  /** From the lens to the deck's origin, mm; the origin lands on the photo's centre. */
  distanceMm: number;
};

/** Where a deck point (mm, y up) lands in the photo (px, y down). */
export function project(cam: Camera, p: Mm): Mm {
  const a = (cam.tiltXDeg * Math.PI) / 180;
  const b = (cam.tiltYDeg * Math.PI) / 180;
  const c = (cam.turnDeg * Math.PI) / 180;
  const x0 = p[0] * Math.cos(c) - p[1] * Math.sin(c);
  const y0 = p[0] * Math.sin(c) + p[1] * Math.cos(c);
  const x1 = x0 * Math.cos(b);
  const z1 = -x0 * Math.sin(b);
  const y2 = y0 * Math.cos(a) - z1 * Math.sin(a);
  const z2 = y0 * Math.sin(a) + z1 * Math.cos(a) + cam.distanceMm;
  return [cam.widthPx / 2 + (cam.focalPx * x1) / z2, cam.heightPx / 2 - (cam.focalPx * y2) / z2];
}

export function circle(centre: Mm, diameter: number, n = 180): Mm[] {
  return Array.from({ length: n }, (_, i) => [centre[0] + (diameter / 2) * Math.cos((2 * Math.PI * i) / n), centre[1] + (diameter / 2) * Math.sin((2 * Math.PI * i) / n)] as Mm);
}

/** An arc slot (a transfer passage at the mouth): between two radii, over an angular span, as a closed outline. */
export function arcSlot(innerMm: number, outerMm: number, centreDeg: number, spanDeg: number, n = 24): Mm[] {
  const a0 = ((centreDeg - spanDeg / 2) * Math.PI) / 180;
  const a1 = ((centreDeg + spanDeg / 2) * Math.PI) / 180;
  const out: Mm[] = [];
  for (let i = 0; i <= n; i++) out.push([outerMm * Math.cos(a0 + ((a1 - a0) * i) / n), outerMm * Math.sin(a0 + ((a1 - a0) * i) / n)]);
  for (let i = n; i >= 0; i--) out.push([innerMm * Math.cos(a0 + ((a1 - a0) * i) / n), innerMm * Math.sin(a0 + ((a1 - a0) * i) / n)]);
  return out;
}

/** An eight-sided deck: a rectangle with its corners cut at 45°. */
export function chamferedDeck(widthMm: number, heightMm: number, chamferMm: number): Mm[] {
  const w = widthMm / 2;
  const h = heightMm / 2;
  const c = chamferMm;
  return [[-w + c, -h], [w - c, -h], [w, -h + c], [w, h - c], [w - c, h], [-w + c, h], [-w, h - c], [-w, -h + c]];
}

export type DeckScene = {
  deck: Mm[];
  mouth: Mm[];
  passages: Mm[][];
  studs: { at: Mm; diameterMm: number }[];
};

/** Paints the scene as seen by the camera in the page's canvas and answers the image file's bytes. */
export async function renderDeckPhoto(page: Page, cam: Camera, scene: DeckScene, type: "image/png" | "image/jpeg" = "image/png", quality = 0.85): Promise<Buffer> {
  const px = (pts: Mm[]) => pts.map((p) => project(cam, p));
  const shapes = {
    deck: px(scene.deck),
    mouth: px(scene.mouth),
    passages: scene.passages.map(px),
    studs: scene.studs.map((s) => px(circle(s.at, s.diameterMm, 90))),
    // A gasket-face sheen and machining rings around the mouth, so the photo reads as a part.
    rings: [6, 12, 18].map((r) => px(circle([0, 0], 2 * (Math.max(...scene.mouth.map((p) => Math.hypot(p[0], p[1]))) + r), 180))),
  };
  // Sent as text: a bundler's helpers (such as the name keeper) do not exist in the page.
  const base64 = (await page.evaluate(`(${PAINT})(${JSON.stringify({ shapes, width: cam.widthPx, height: cam.heightPx, type, quality })})`)) as string;
  return Buffer.from(base64, "base64");
}

const PAINT = `async function paint({ shapes, width, height, type, quality }) {
  const canvas = document.createElement("canvas");
  canvas.width = width;
  canvas.height = height;
  const g = canvas.getContext("2d");
  // The bench: a dark, slightly uneven background.
  const bench = g.createLinearGradient(0, 0, width, height);
  bench.addColorStop(0, "#2d3134");
  bench.addColorStop(1, "#1d2022");
  g.fillStyle = bench;
  g.fillRect(0, 0, width, height);
  function path(pts) {
    g.beginPath();
    pts.forEach(function (p, i) { if (i) g.lineTo(p[0], p[1]); else g.moveTo(p[0], p[1]); });
    g.closePath();
  }
  // The deck face: machined aluminium, with faint rings from the facing cut.
  const face = g.createLinearGradient(0, 0, width, height * 0.7);
  face.addColorStop(0, "#c9ccce");
  face.addColorStop(0.5, "#b3b7ba");
  face.addColorStop(1, "#a4a8ab");
  path(shapes.deck);
  g.fillStyle = face;
  g.fill();
  g.strokeStyle = "#8d9194";
  g.lineWidth = 2;
  g.stroke();
  g.strokeStyle = "rgba(255,255,255,0.18)";
  g.lineWidth = 1;
  for (const ring of shapes.rings) { path(ring); g.stroke(); }
  for (const p of shapes.passages) { path(p); g.fillStyle = "#4a4f53"; g.fill(); }
  path(shapes.mouth);
  g.fillStyle = "#141618";
  g.fill();
  for (const s of shapes.studs) { path(s); g.fillStyle = "#25292c"; g.fill(); }
  const blob = await new Promise(function (resolve) { canvas.toBlob(resolve, type, quality); });
  const bytes = new Uint8Array(await blob.arrayBuffer());
  let text = "";
  for (let i = 0; i < bytes.length; i += 0x8000) text += String.fromCharCode.apply(null, bytes.subarray(i, i + 0x8000));
  return btoa(text);
}`;
