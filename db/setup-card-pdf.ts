import "server-only";
import { createRequire } from "node:module";
import { join } from "node:path";
import { MM_PER_INCH } from "@/geometry";
import { FIT, printed, SURFACE } from "@/model/palette";
import type { CardDrawing, CardVerdict, SetupCard } from "./setup-card";

// The setup card as a PDF, drawn on the server with pdfkit: the figures on one A4 page, then each drawing on
// a landscape A4 page of its own at its stated scale (full size when it fits), with a bar to check the print.
// The app's two faces are embedded through pdfkit's own font API from static TrueType files (the npm font
// packages of the same families), so pdfkit subsets them itself.

// pdfkit and fontkit read data files next to their own code, so they are loaded from node_modules at
// run time rather than bundled; so is svg-to-pdfkit, which tells its pattern objects apart by their
// function name (a name a minifying bundler may rename).
const nodeRequire = createRequire(join(process.cwd(), "package.json"));

/** The TrueType files embedded in the card (each path written out, so the build traces only these files). */
export const FONT_FILES = {
  body: join(process.cwd(), "node_modules", "@expo-google-fonts", "inter", "400Regular", "Inter_400Regular.ttf"),
  numbers: join(process.cwd(), "node_modules", "@expo-google-fonts", "source-code-pro", "400Regular", "SourceCodePro_400Regular.ttf"),
} as const;

// The palette's light theme (model/palette.ts): a warning is the one red of the fit code.
const INK = SURFACE.ink.light;
const INK2 = SURFACE["ink-2"].light;
const ACCENT = SURFACE.accent.light;
const WARN = printed(FIT.interfere);
const RULE = SURFACE.rule.light;

/** Points per millimetre. */
export const PT_PER_MM = 72 / MM_PER_INCH;
const MARGIN = 36;
/** The drawing pages' margin: 10 mm, as the printable page's. */
const SHEET_MARGIN = 10 * PT_PER_MM;

type Doc = PDFKit.PDFDocument;
type Svg2Pdf = typeof import("svg-to-pdfkit");

/** The card as a PDF: the figures on page 1, each drawing on a landscape page after it. */
export async function setupCardPdf(card: SetupCard, drawings: readonly CardDrawing[] = []): Promise<Buffer> {
  const PDFDocument = nodeRequire("pdfkit") as typeof import("pdfkit");
  const SVGtoPDF = nodeRequire("svg-to-pdfkit") as Svg2Pdf;
  const doc = new PDFDocument({ size: "A4", margin: MARGIN, info: { Title: card.title, Author: card.shopName, Subject: "Bench setup card", Creator: "Borewright" } });
  doc.registerFont("body", FONT_FILES.body);
  doc.registerFont("num", FONT_FILES.numbers);
  const chunks: Buffer[] = [];
  doc.on("data", (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on("end", () => resolve(Buffer.concat(chunks)));
    doc.on("error", reject);
  });
  // A plan the study calls cannot-fit says so on every page, whatever adds the page.
  everyPage(doc, card.verdict);
  doc.on("pageAdded", () => everyPage(doc, card.verdict));

  figuresPage(doc, card, drawings);
  drawings.forEach((d, i) => drawingPage(doc, SVGtoPDF, card, d, i + 2));
  doc.end();
  return done;
}

/** The verdict's line in the top margin of the page, for a cannot-fit plan. */
function everyPage(doc: Doc, verdict: CardVerdict) {
  if (!verdict.everyPage) return;
  const { x, y } = doc;
  const left = doc.page.margins.left;
  const width = doc.page.width - left - doc.page.margins.right;
  const top = Math.max(8, doc.page.margins.top - 24);
  doc.rect(left, top, width, 17).lineWidth(1).strokeColor(verdict.color).stroke();
  doc.font("body").fontSize(8.5).fillColor(verdict.color).text(verdict.everyPage, left + 5, top + 4.5, { width: width - 10, height: 10, lineBreak: false, ellipsis: true });
  doc.x = x;
  doc.y = y;
}

/** Page 1: the verdict, the job and the plan, the rig settings, the checks and cautions, the blanks to fill in. */
function figuresPage(doc: Doc, card: SetupCard, drawings: readonly CardDrawing[]) {
  const left = MARGIN;
  const width = doc.page.width - 2 * MARGIN;
  const gutter = 16;
  const half = (width - gutter) / 2;
  const heading = (t: string, x = left, w = width) => {
    doc.moveDown(0.4).font("body").fontSize(10.5).fillColor(ACCENT).text(t.toUpperCase(), x, undefined, { characterSpacing: 0.6, width: w });
    const y = doc.y + 1;
    doc.moveTo(x, y).lineTo(x + w, y).lineWidth(0.5).strokeColor(RULE).stroke();
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

  doc.font("body").fontSize(16).fillColor(INK).text(card.title, left, MARGIN);
  doc.font("body").fontSize(8.5).fillColor(INK2).text(`${card.shopName} · bench setup card`);
  verdictBlock(doc, card.verdict, card.plan.length ? card.header.find((l) => l.label === "Kit")?.value ?? "" : "", left, width);
  // The job and the plan side by side, as on the printable page.
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
    doc.moveDown(0.3).font("body").fontSize(8).fillColor(INK2).text(`Drawings: ${drawings.map((d, i) => `${d.title} (${d.scaleText}, page ${i + 2})`).join("; ")}.`, left, undefined, { width });
  }
  // The checks beside the cautions and the plan's warnings, as on the printable page.
  const below = doc.y;
  heading("Set-up checks, in order", left, half);
  card.checks.forEach((c, i) => {
    const y = doc.y;
    doc.rect(left, y + 1, 7, 7).lineWidth(0.6).strokeColor(INK2).stroke();
    doc.font("body").fontSize(7.5).fillColor(INK).text(`${i + 1}. ${c}`, left + 12, y, { width: half - 12 });
    doc.y += 0.5;
  });
  const checksEnd = doc.y;
  const right = left + half + gutter;
  doc.y = below;
  heading("Cautions", right, half);
  for (const c of card.cautions) {
    doc.font("body").fontSize(7.5).fillColor(INK).text(`!  ${c}`, right, undefined, { width: half });
    doc.y += 0.5;
  }
  // The plan's warnings under whichever column ends higher, so the page keeps room for the readings.
  if (card.warnings.length) {
    const cautionsEnd = doc.y;
    const x = checksEnd < cautionsEnd ? left : right;
    doc.y = x === left ? checksEnd : cautionsEnd;
    heading("Warnings from the plan", x, half);
    for (const w of card.warnings) doc.font("body").fontSize(8).fillColor(WARN).text(`•  ${w}`, x, undefined, { width: half });
    doc.y = Math.max(doc.y, cautionsEnd);
  }
  doc.x = left;
  doc.y = Math.max(checksEnd, doc.y);
  heading("After-cut readings");
  for (const b of card.blanks) {
    const y = doc.y;
    doc.font("body").fontSize(8.5).fillColor(INK).text(b.label.replace(/☐/g, "[  ]"), left, y + 2, { width: b.cells ? 250 : width });
    const cell = Math.min(80, (width - 260) / Math.max(1, b.cells) - 6);
    for (let i = 0; i < b.cells; i++) {
      const x = left + 260 + i * (cell + 6);
      doc.rect(x, y, cell, 13).lineWidth(0.6).strokeColor(INK2).stroke();
      const tag = b.cellLabels?.[i];
      if (tag) doc.font("body").fontSize(5.5).fillColor(INK2).text(tag, x + 2, y + 1.5, { width: cell - 4, lineBreak: false });
    }
    doc.y = Math.max(doc.y, y + 14) + 1.5;
  }
  doc.moveDown(0.2).font("body").fontSize(7).fillColor(INK2).text("Borewright plans cuts; it does not replace the kit maker's instructions, local regulations or a qualified machinist.", left, undefined, { width });
}

/** The verdict at the top of page 1: its words in its colour, framed in it, and why for a kit that cannot fit. */
function verdictBlock(doc: Doc, verdict: CardVerdict, kitName: string, left: number, width: number) {
  const top = doc.y + 6;
  doc.font("body").fontSize(12).fillColor(verdict.color).text(`${verdict.words}${kitName ? ` — ${kitName}` : ""}`, left + 8, top + 6, { width: width - 16 });
  if (verdict.reasons.length) doc.font("body").fontSize(8.5).fillColor(INK).text(`Why: ${verdict.reasons.join("; ")}.`, left + 8, undefined, { width: width - 16 });
  const bottom = doc.y + 5;
  doc.rect(left, top, width, bottom - top).lineWidth(1.4).strokeColor(verdict.color).stroke();
  doc.x = left;
  doc.y = bottom + 2;
}

/**
 * One drawing on a landscape A4 page of its own, at its stated scale, centred; below it the scale bar (half
 * filled, as on a map) and the caption that says the scale and how to check the print.
 */
function drawingPage(doc: Doc, SVGtoPDF: Svg2Pdf, card: SetupCard, d: CardDrawing, page: number) {
  doc.addPage({ size: "A4", layout: "landscape", margin: SHEET_MARGIN });
  const left = SHEET_MARGIN;
  const width = doc.page.width - 2 * SHEET_MARGIN;
  doc.font("body").fontSize(10.5).fillColor(ACCENT).text(`${d.title} — ${card.reference}, page ${page}`, left, SHEET_MARGIN, { width });
  const w = d.widthMm * d.scale * PT_PER_MM;
  const h = d.heightMm * d.scale * PT_PER_MM;
  const x = left + (width - w) / 2;
  const y = doc.y + 4;
  // The drawing's own size attributes are its true size in millimetres; here its printed size is set in points.
  const svg = d.svg.replace(/^<svg([^>]*?) width="[^"]*" height="[^"]*"/, `<svg$1 width="${w}" height="${h}"`);
  SVGtoPDF(doc, svg, x, y, { width: w, height: h, assumePt: true, fontCallback: () => "body", warningCallback: () => undefined });
  const barY = y + h + 8;
  const bar = d.barMm * d.scale * PT_PER_MM;
  doc.rect(x, barY, bar, 4.5).fillColor(INK).fill();
  doc.rect(x + bar / 2, barY + 0.5, bar / 2 - 0.5, 3.5).fillColor("#ffffff").fill();
  doc.font("num").fontSize(8).fillColor(INK).text(d.barLabel, x + bar + 6, barY - 1.5, { lineBreak: false });
  doc.font("body").fontSize(8).fillColor(INK2).text(d.caption, x, barY + 10, { width: Math.max(w, 300) });
}
