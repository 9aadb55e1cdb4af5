// Measures what a PDF draws, as printed: each page's size and the boxes of its filled and stroked paths in
// millimetres, read with pdfjs-dist's operator list (the page's own transforms applied), and its text.
import { getDocument, OPS } from "pdfjs-dist/legacy/build/pdf.mjs";

export type Box = { x0: number; y0: number; x1: number; y1: number; widthMm: number; heightMm: number };
export type MeasuredPage = { widthMm: number; heightMm: number; boxes: Box[]; text: string };

const MM_PER_PT = 25.4 / 72;
type M = [number, number, number, number, number, number];
const mul = (m: M, n: M): M => [
  m[0] * n[0] + m[2] * n[1],
  m[1] * n[0] + m[3] * n[1],
  m[0] * n[2] + m[2] * n[3],
  m[1] * n[2] + m[3] * n[3],
  m[0] * n[4] + m[2] * n[5] + m[4],
  m[1] * n[4] + m[3] * n[5] + m[5],
];
const apply = (m: M, x: number, y: number): [number, number] => [m[0] * x + m[2] * y + m[4], m[1] * x + m[3] * y + m[5]];

/** Every page of the PDF: its size, the page-space box of each path it paints (in mm), and its text. */
export async function measurePdf(pdf: Uint8Array): Promise<MeasuredPage[]> {
  const doc = await getDocument({ data: pdf, useSystemFonts: false, disableFontFace: true, isEvalSupported: false }).promise;
  const pages: MeasuredPage[] = [];
  for (let n = 1; n <= doc.numPages; n++) {
    const page = await doc.getPage(n);
    const [vx0, vy0, vx1, vy1] = page.view;
    const ops = await page.getOperatorList();
    const boxes: Box[] = [];
    let ctm: M = [1, 0, 0, 1, 0, 0];
    const stack: M[] = [];
    for (let i = 0; i < ops.fnArray.length; i++) {
      const fn = ops.fnArray[i];
      const args = ops.argsArray[i] as unknown[];
      if (fn === OPS.save) stack.push(ctm);
      else if (fn === OPS.restore) ctm = stack.pop() ?? ctm;
      else if (fn === OPS.transform) ctm = mul(ctm, args as M);
      else if (fn === OPS.paintFormXObjectBegin) {
        stack.push(ctm);
        if (Array.isArray(args[0]) || ArrayBuffer.isView(args[0])) ctm = mul(ctm, Array.from(args[0] as ArrayLike<number>) as M);
      } else if (fn === OPS.paintFormXObjectEnd) ctm = stack.pop() ?? ctm;
      else if (fn === OPS.constructPath) {
        const minMax = args[2] as ArrayLike<number> | null;
        if (!minMax || !Number.isFinite(minMax[0])) continue;
        const corners = [apply(ctm, minMax[0], minMax[1]), apply(ctm, minMax[2], minMax[3]), apply(ctm, minMax[0], minMax[3]), apply(ctm, minMax[2], minMax[1])];
        const xs = corners.map((c) => c[0]);
        const ys = corners.map((c) => c[1]);
        const b = { x0: Math.min(...xs) * MM_PER_PT, y0: Math.min(...ys) * MM_PER_PT, x1: Math.max(...xs) * MM_PER_PT, y1: Math.max(...ys) * MM_PER_PT };
        boxes.push({ ...b, widthMm: b.x1 - b.x0, heightMm: b.y1 - b.y0 });
      }
    }
    const content = await page.getTextContent();
    const text = content.items.map((it) => ("str" in it ? it.str : "")).join(" ");
    pages.push({ widthMm: (vx1 - vx0) * MM_PER_PT, heightMm: (vy1 - vy0) * MM_PER_PT, boxes, text });
  }
  await doc.destroy();
  return pages;
}

/** The widest painted box of a page whose height is at least `minHeightMm` (a drawing's sheet, not a rule or a bar). */
export function widestBox(page: MeasuredPage, minHeightMm = 20): Box | undefined {
  return page.boxes.filter((b) => b.heightMm >= minHeightMm).sort((a, b) => b.widthMm - a.widthMm)[0];
}
