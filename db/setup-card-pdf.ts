import "server-only";
import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import { join } from "node:path";
import type { Drawing } from "@/scene/drawing/svg";
import type { SetupCard } from "./setup-card";

// The setup card as a PDF, drawn on the server with pdfkit, one A4 page, with the app's own fonts
// embedded (the body face and the monospace face for numbers, from the npm font packages).
//
// Those packages ship WOFF2 only. pdfkit reads WOFF2 through fontkit, but fontkit's subsetter copies
// each glyph's raw bytes from the 'glyf' table, which in WOFF2 is stored transformed, so the subset
// comes out broken (or throws on composite glyphs). We therefore re-encode every glyph of the subset from
// its decoded outline as a plain TrueType simple glyph (uncompressed flags and 16-bit deltas; hinting
// dropped, which a PDF viewer does not use). The result is a valid embedded TrueType subset.

// pdfkit and fontkit read data files next to their own code, so they are loaded from node_modules at
// run time rather than bundled; so is svg-to-pdfkit, which tells its pattern objects apart by their
// function name (a name a minifying bundler may rename).
const nodeRequire = createRequire(join(process.cwd(), "package.json"));

type Point = { x: number; y: number; onCurve: boolean };
type Glyph = { numberOfContours: number; advanceWidth: number; _getContours(): Point[][]; _getMetrics(): { leftBearing: number } };
type Subset = {
  font: { getGlyph(id: number): Glyph };
  glyf: Uint8Array[];
  loca: { offsets: number[] };
  hmtx: { metrics: { advance: number; bearing: number }[] };
  offset: number;
  _addGlyph(gid: number): number;
};
type FontkitFont = { createSubset(): Subset; layout: unknown };

/** One glyph outline as a TrueType simple glyph: header, contour ends, no instructions, on-curve flags, 16-bit deltas. */
export function encodeSimpleGlyph(contours: Point[][]): Uint8Array {
  const pts = contours.flat();
  if (pts.length === 0) return new Uint8Array(0);
  const xs = pts.map((p) => Math.round(p.x));
  const ys = pts.map((p) => Math.round(p.y));
  const size = 10 + 2 * contours.length + 2 + pts.length + 4 * pts.length;
  const buf = new Uint8Array(size + ((4 - (size % 4)) % 4));
  const v = new DataView(buf.buffer);
  v.setInt16(0, contours.length);
  v.setInt16(2, Math.min(...xs));
  v.setInt16(4, Math.min(...ys));
  v.setInt16(6, Math.max(...xs));
  v.setInt16(8, Math.max(...ys));
  let o = 10;
  let end = -1;
  for (const c of contours) {
    end += c.length;
    v.setUint16(o, end);
    o += 2;
  }
  v.setUint16(o, 0);
  o += 2;
  for (const p of pts) buf[o++] = p.onCurve ? 1 : 0;
  let last = 0;
  for (const x of xs) {
    v.setInt16(o, x - last);
    last = x;
    o += 2;
  }
  last = 0;
  for (const y of ys) {
    v.setInt16(o, y - last);
    last = y;
    o += 2;
  }
  return buf;
}

const fontCache = new Map<string, Buffer>();

/** A WOFF2 (or TTF) font file opened by fontkit, whose subsets re-encode glyphs from their outlines. */
export function embeddableFont(path: string): FontkitFont {
  const fontkit = nodeRequire("fontkit") as { create(b: Buffer): FontkitFont };
  let bytes = fontCache.get(path);
  if (!bytes) {
    bytes = readFileSync(path);
    fontCache.set(path, bytes);
  }
  const font = fontkit.create(bytes);
  const create = font.createSubset.bind(font);
  font.createSubset = () => {
    const subset = create();
    subset._addGlyph = function addGlyph(this: Subset, gid: number) {
      const glyph = this.font.getGlyph(gid);
      const buffer = encodeSimpleGlyph(glyph.numberOfContours === 0 ? [] : glyph._getContours());
      this.glyf.push(buffer);
      this.loca.offsets.push(this.offset);
      this.hmtx.metrics.push({ advance: glyph.advanceWidth, bearing: glyph._getMetrics().leftBearing });
      this.offset += buffer.length;
      return this.glyf.length - 1;
    };
    return subset;
  };
  return font;
}

export const FONT_FILES = {
  body: "node_modules/@fontsource-variable/inter/files/inter-latin-wght-normal.woff2",
  numbers: "node_modules/@fontsource-variable/source-code-pro/files/source-code-pro-latin-wght-normal.woff2",
};

type EmbeddedLike = { unicode?: number[][]; subset?: { glyphs: number[] }; font?: { _cmapProcessor?: { codePointsForGlyph(id: number): number[] } } };

/**
 * fontkit caches glyph objects by id, and a glyph first reached through a substitution carries no code
 * points; pdfkit then writes an empty entry in the text map and the character cannot be searched or
 * copied. Fill such entries from the font's own character map before the document is finalised.
 */
function repairUnicodeMaps(doc: unknown) {
  const families = (doc as { _fontFamilies?: Record<string, EmbeddedLike> })._fontFamilies ?? {};
  for (const f of Object.values(families)) {
    const cmap = f.font?._cmapProcessor;
    if (!f.unicode || !f.subset || !cmap) continue;
    f.unicode = f.unicode.map((cp, gid) => (cp && cp.length ? cp : gid === 0 ? [0] : cmap.codePointsForGlyph(f.subset!.glyphs[gid] ?? 0).slice(0, 1)));
  }
}

const INK = "#2b2f33";
const INK2 = "#5b6167";
const ACCENT = "#0f5e5c";
const WARN = "#b3362c";

const MM = 72 / 25.4;
/** The drawings' height on the card, in points: at most this, and below the least they are left out. */
const DRAWING_HEIGHT = { max: 230, min: 90 };

type Svg2Pdf = typeof import("svg-to-pdfkit");

/**
 * The card as a one-page A4 PDF, with the plan and section drawings side by side when given. The page
 * is laid out once without the drawings to learn how much room the text leaves them, then for real:
 * the drawings take that room (up to DRAWING_HEIGHT.max), so a card with many warnings still fits one page.
 */
export async function setupCardPdf(card: SetupCard, drawings: readonly Drawing[] = []): Promise<Buffer> {
  const PDFDocument = nodeRequire("pdfkit") as typeof import("pdfkit");
  const SVGtoPDF = nodeRequire("svg-to-pdfkit") as Svg2Pdf;
  let drawingHeight = 0;
  if (drawings.length) {
    const probe = layOut(PDFDocument, SVGtoPDF, card, drawings, 0);
    const room = probe.doc.page.height - probe.doc.page.margins.bottom - probe.endY - 2;
    probe.doc.end();
    await probe.done;
    drawingHeight = Math.min(DRAWING_HEIGHT.max, Math.floor(room));
  }
  const card1 = layOut(PDFDocument, SVGtoPDF, card, drawingHeight >= DRAWING_HEIGHT.min ? drawings : [], drawingHeight);
  repairUnicodeMaps(card1.doc);
  card1.doc.end();
  return card1.done;
}

/** Draws the card; with drawings and a height of 0 it draws their heading and captions only (the measuring pass). */
function layOut(PDFDocument: typeof import("pdfkit"), SVGtoPDF: Svg2Pdf, card: SetupCard, drawings: readonly Drawing[], drawingHeight: number) {
  const doc = new PDFDocument({ size: "A4", margin: 36, info: { Title: card.title, Author: card.shopName, Subject: "Bench setup card", Creator: "Borewright" } });
  doc.registerFont("body", embeddableFont(join(process.cwd(), FONT_FILES.body)) as unknown as string);
  doc.registerFont("num", embeddableFont(join(process.cwd(), FONT_FILES.numbers)) as unknown as string);
  const chunks: Buffer[] = [];
  doc.on("data", (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on("end", () => resolve(Buffer.concat(chunks)));
    doc.on("error", reject);
  });

  const left = 36;
  const width = doc.page.width - 72;
  const gutter = 16;
  const half = (width - gutter) / 2;
  const heading = (t: string, x = left, w = width) => {
    doc.moveDown(0.4).font("body").fontSize(10.5).fillColor(ACCENT).text(t.toUpperCase(), x, undefined, { characterSpacing: 0.6, width: w });
    const y = doc.y + 1;
    doc.moveTo(x, y).lineTo(x + w, y).lineWidth(0.5).strokeColor("#d9d3c6").stroke();
    doc.moveDown(0.25);
  };
  const lines = (items: { label: string; value: string; warn?: boolean }[], labelWidth = 190, x = left, w = width, size = 8.5) => {
    for (const l of items) {
      const y = doc.y;
      doc.font("body").fontSize(size).fillColor(INK2).text(l.label, x, y, { width: labelWidth });
      const h1 = doc.y - y;
      doc.font("num").fontSize(size).fillColor(l.warn ? WARN : INK).text(l.value, x + labelWidth + 6, y, { width: w - labelWidth - 6 });
      doc.y = Math.max(doc.y, y + h1) + 1.5;
    }
  };

  doc.font("body").fontSize(16).fillColor(INK).text(card.title, left, 36);
  doc.font("body").fontSize(8.5).fillColor(INK2).text(`${card.shopName} · bench setup card · one page`);
  // The job and the plan side by side, as on the printable page, to leave room for the drawings.
  const top = doc.y;
  heading("Job", left, half);
  lines(card.header, 62, left, half, 8);
  const leftEnd = doc.y;
  doc.y = top;
  heading("The plan", left + half + gutter, half);
  lines(card.plan, 122, left + half + gutter, half, 8);
  doc.y = Math.max(leftEnd, doc.y);
  heading("Rig settings");
  if (card.rig) lines(card.rig);
  else doc.font("body").fontSize(8.5).fillColor(WARN).text(card.rigMissing ?? "", left);
  if (drawings.length) {
    heading("Drawings");
    drawingsRow(doc, SVGtoPDF, drawings, left, width, drawingHeight);
  }
  // The checks beside the cautions and the plan's warnings, as on the printable page.
  const below = doc.y;
  heading("Set-up checks, in order", left, half);
  card.checks.forEach((c, i) => {
    const y = doc.y;
    doc.rect(left, y + 1, 7, 7).lineWidth(0.6).strokeColor(INK2).stroke();
    doc.font("body").fontSize(8).fillColor(INK).text(`${i + 1}. ${c}`, left + 12, y, { width: half - 12 });
    doc.y += 1;
  });
  const checksEnd = doc.y;
  const right = left + half + gutter;
  doc.y = below;
  heading("Cautions", right, half);
  for (const c of card.cautions) {
    doc.font("body").fontSize(8).fillColor(INK).text(`!  ${c}`, right, undefined, { width: half });
    doc.y += 1;
  }
  if (card.warnings.length) {
    heading("Warnings from the plan", right, half);
    for (const w of card.warnings) doc.font("body").fontSize(8).fillColor(WARN).text(`•  ${w}`, right, undefined, { width: half });
  }
  doc.x = left;
  doc.y = Math.max(checksEnd, doc.y);
  heading("After-cut readings");
  for (const b of card.blanks) {
    const y = doc.y;
    doc.font("body").fontSize(8.5).fillColor(INK).text(b.label.replace(/☐/g, "[  ]"), left, y + 3, { width: b.cells ? 250 : width });
    const cell = Math.min(80, (width - 260) / Math.max(1, b.cells) - 6);
    for (let i = 0; i < b.cells; i++) {
      const x = left + 260 + i * (cell + 6);
      doc.rect(x, y, cell, 15).lineWidth(0.6).strokeColor(INK2).stroke();
      const tag = b.cellLabels?.[i];
      if (tag) doc.font("body").fontSize(5.5).fillColor(INK2).text(tag, x + 2, y + 1.5, { width: cell - 4, lineBreak: false });
    }
    doc.y = Math.max(doc.y, y + 17) + 2;
  }
  doc.moveDown(0.5).font("body").fontSize(7).fillColor(INK2).text("Borewright plans cuts; it does not replace the kit maker's instructions, local regulations or a qualified machinist.", left, undefined, { width });
  return { doc, done, endY: doc.y };
}

/**
 * The drawings side by side, the first (the plan) as tall as the room allows but at most PLAN_SHARE of
 * the width, the others (the section, wide and low) sharing the rest of the width, centred in the row.
 * Vector paths, text in the body font, and under each its scale: the drawings are dimensioned, the print
 * is not to be measured.
 */
function drawingsRow(doc: PDFKit.PDFDocument, SVGtoPDF: Svg2Pdf, drawings: readonly Drawing[], left: number, width: number, height: number) {
  const gap = 14;
  const PLAN_SHARE = 0.5;
  const ratio = drawings.map((d) => d.widthMm / d.heightMm);
  const size: { w: number; h: number }[] = [];
  const first = { h: Math.min(height, (width * PLAN_SHARE) / ratio[0]), w: 0 };
  first.w = first.h * ratio[0];
  size.push(first);
  const rest = drawings.length > 1 ? (width - first.w - gap * (drawings.length - 1)) / (drawings.length - 1) : 0;
  for (let i = 1; i < drawings.length; i++) {
    const h = Math.min(height, rest / ratio[i]);
    size.push({ w: h * ratio[i], h });
  }
  const rowH = Math.max(...size.map((z) => z.h));
  const total = size.reduce((a, z) => a + z.w, 0) + gap * (drawings.length - 1);
  const y = doc.y + 2;
  let x = left + (width - total) / 2;
  drawings.forEach((d, i) => {
    const { w, h } = size[i];
    const top = y + (rowH - h) / 2;
    if (h > 0) {
      // The drawing's own size attributes are in millimetres; on the card its size is set in points.
      const svg = d.svg.replace(/^<svg([^>]*?) width="[^"]*" height="[^"]*"/, `<svg$1 width="${w}" height="${h}"`);
      SVGtoPDF(doc, svg, x, top, { width: w, height: h, assumePt: true, fontCallback: () => "body", warningCallback: () => undefined });
    }
    const percent = Math.round((h / d.heightMm / MM) * 100);
    doc.font("body").fontSize(6.5).fillColor(INK2).text(`shown at ${percent} % of full size; do not measure the print`, x, y + rowH + 2, { width: Math.max(w, 60), align: "center", lineBreak: false });
    x += w + gap;
  });
  doc.x = left;
  doc.y = y + rowH + 12;
}
