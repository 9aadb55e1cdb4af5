import type { Vec2 } from "@/geometry";
import { FIT, patternDefs, printed, SCENE, SURFACE } from "@/model/palette";

// Small helpers that write SVG markup. Every number is rounded to 0.001 mm; every text is escaped.

/** Colours of the drawings: the palette's light theme (model/palette.ts), so a printout reads the same. */
export const INK = {
  ink: SURFACE.ink.light,
  ink2: SURFACE["ink-2"].light,
  /** Thin construction lines (centre lines, extension lines): lighter than any text. */
  ink3: "#8a8f93",
  rule: SURFACE.rule.light,
  paper: SURFACE.card.light,
  paper2: SURFACE["paper-2"].light,
  accent: SURFACE.accent.light,
  clear: printed(FIT.clear),
  tight: printed(FIT.tight),
  interfere: printed(FIT.interfere),
  counterbore: printed(FIT.counterbore),
  removed: printed(FIT.removed),
  wallLow: printed(FIT.wallLow),
  port: printed(FIT.port),
  passage: printed(FIT.passage),
  passageSoft: FIT.passage.soft.light,
  sheet: SCENE.sheet,
  gasket: SCENE.gasket,
} as const;

/** A finished drawing: its size in mm (1 unit = 1 mm, so it prints to scale) and its markup. */
export interface Drawing {
  readonly title: string;
  readonly widthMm: number;
  readonly heightMm: number;
  readonly svg: string;
}

export const n = (v: number) => String(Math.round(v * 1000) / 1000);

export function esc(s: string): string {
  // Most texts need nothing: skip the four replacements for them (a drawing being dragged writes thousands).
  if (!/[&<>"]/.test(s)) return s;
  return s.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");
}

export type Attrs = Record<string, string | number | undefined>;

function attrs(a: Attrs): string {
  return Object.entries(a)
    .filter(([, v]) => v !== undefined)
    .map(([k, v]) => ` ${k}="${typeof v === "number" ? n(v) : esc(v as string)}"`)
    .join("");
}

export const el = (tag: string, a: Attrs, inner?: string) => (inner === undefined ? `<${tag}${attrs(a)}/>` : `<${tag}${attrs(a)}>${inner}</${tag}>`);

/** A closed path through points, in drawing coordinates. */
export function ringPath(ring: readonly Vec2[]): string {
  return ring.map(([x, y], i) => `${i ? "L" : "M"}${n(x)} ${n(y)}`).join("") + "Z";
}

export function text(x: number, y: number, s: string, size: number, a: Attrs = {}): string {
  return el("text", { x, y, "font-size": size, "font-family": "Inter, ui-sans-serif, sans-serif", fill: INK.ink, ...a }, esc(s));
}

/** Rough width of a label, for keeping it inside the sheet. */
export function textWidth(s: string, size: number): number {
  return s.length * size * 0.56;
}

export const DEFS = `<defs>${el("marker", { id: "arw", viewBox: "0 0 6 6", refX: 6, refY: 3, markerWidth: 2.4, markerHeight: 2.4, orient: "auto-start-reverse", markerUnits: "userSpaceOnUse" }, el("path", { d: "M0 0L6 3L0 6Z", fill: INK.ink }))}${el(
  "pattern",
  { id: "hatch", width: 2.2, height: 2.2, patternUnits: "userSpaceOnUse", patternTransform: "rotate(45)" },
  el("rect", { width: 2.2, height: 2.2, fill: INK.paper2 }) + el("line", { x1: 0, y1: 0, x2: 0, y2: 2.2, stroke: INK.ink3, "stroke-width": 0.3 }),
)}${patternDefs()}</defs>`;

/** A horizontal dimension from xa to xb drawn at height y, extension lines from the feature heights fa and fb; the text above the line. */
export function hdim(xa: number, xb: number, y: number, fa: number, fb: number, label: string, size: number, color: string = INK.ink): string {
  const ext = (x: number, f: number) => el("line", { x1: x, y1: f, x2: x, y2: y + Math.sign(y - f) * 1, stroke: INK.ink3, "stroke-width": 0.18 });
  return [
    ext(xa, fa),
    ext(xb, fb),
    el("line", { x1: xa, y1: y, x2: xb, y2: y, stroke: color, "stroke-width": 0.22, "marker-start": "url(#arw)", "marker-end": "url(#arw)" }),
    text((xa + xb) / 2, y - size * 0.35, label, size, { "text-anchor": "middle", fill: color }),
  ].join("");
}

/** A vertical dimension from ya to yb drawn at x, extension lines from the feature position fx; the text beside it, to the right or the left. */
export function vdim(x: number, ya: number, yb: number, fx: number, label: string, size: number, color: string = INK.ink): string {
  const right = x >= fx;
  const ext = (y: number) => el("line", { x1: fx, y1: y, x2: x + (right ? 1 : -1), y2: y, stroke: INK.ink3, "stroke-width": 0.18 });
  return [
    ext(ya),
    ext(yb),
    el("line", { x1: x, y1: ya, x2: x, y2: yb, stroke: color, "stroke-width": 0.22, "marker-start": "url(#arw)", "marker-end": "url(#arw)" }),
    text(x + (right ? size * 0.5 : -size * 0.5), (ya + yb) / 2 + size * 0.35, label, size, { "text-anchor": right ? "start" : "end", fill: color }),
  ].join("");
}

/** A leader from a point to a shelf with a label; the label sits left or right of the shelf. */
export function leader(from: Vec2, to: Vec2, label: string, size: number, color: string = INK.ink): string {
  const right = to[0] >= from[0];
  const shelf = textWidth(label, size) + 1;
  const end: Vec2 = [to[0] + (right ? shelf : -shelf), to[1]];
  return [
    el("polyline", { points: `${n(from[0])},${n(from[1])} ${n(to[0])},${n(to[1])} ${n(end[0])},${n(end[1])}`, fill: "none", stroke: color, "stroke-width": 0.2 }),
    el("circle", { cx: from[0], cy: from[1], r: 0.45, fill: color }),
    text(right ? to[0] + 0.5 : to[0] - 0.5, to[1] - 0.8, label, size, { "text-anchor": right ? "start" : "end", fill: color }),
  ].join("");
}

/** Wraps the body into a standalone SVG document whose size is in millimetres (prints to scale); "group" for a drawing with controls in it. */
export function sheet(title: string, minX: number, minY: number, w: number, h: number, body: string, role: "img" | "group" = "img"): Drawing {
  const svg =
    `<svg xmlns="http://www.w3.org/2000/svg" width="${n(w)}mm" height="${n(h)}mm" viewBox="${n(minX)} ${n(minY)} ${n(w)} ${n(h)}" role="${role}" aria-label="${esc(title)}">` +
    `<title>${esc(title)}</title>${DEFS}${el("rect", { x: minX, y: minY, width: w, height: h, fill: INK.sheet })}${body}</svg>`;
  return { title, widthMm: w, heightMm: h, svg };
}
