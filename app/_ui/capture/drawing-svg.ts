import { DOMParser } from "@xmldom/xmldom";
import svgpath from "svgpath";
import { counted, cubicPoints, noClosed, round, sizeOf, svgArcPoints, tidyRing } from "./drawing-curves";
import { type DrawingUnit, MAX_DRAWING_ENTITIES, DrawingFileError, type P, type DrawingShape, type DrawingRead } from "./drawing-types";

// An SVG drawing's closed shapes: circles, ellipses, rectangles, polygons and closed paths, with their transforms.

// ---------------------------------------------------------------- SVG

const SVG_SHAPES = ["path", "circle", "ellipse", "rect", "polygon", "polyline", "line"];

function num(el: Element, name: string, fallback = 0): number {
  const raw = el.getAttribute(name);
  if (raw == null || raw.trim() === "") return fallback;
  const v = parseFloat(raw);
  return Number.isFinite(v) ? v : fallback;
}

function transformOf(el: Element): string {
  const parts: string[] = [];
  for (let n: Node | null = el; n && n.nodeType === 1; n = n.parentNode) {
    const t = (n as Element).getAttribute("transform");
    if (t) parts.unshift(t);
  }
  return parts.join(" ");
}

function pathDataOf(el: Element): string | null {
  switch (el.tagName.toLowerCase()) {
    case "path":
      return el.getAttribute("d");
    case "rect": {
      const x = num(el, "x"), y = num(el, "y"), w = num(el, "width"), h = num(el, "height");
      if (!(w > 0 && h > 0)) return null;
      let rx = num(el, "rx", NaN), ry = num(el, "ry", NaN);
      if (Number.isNaN(rx)) rx = Number.isNaN(ry) ? 0 : ry;
      if (Number.isNaN(ry)) ry = rx;
      rx = Math.min(rx, w / 2);
      ry = Math.min(ry, h / 2);
      if (rx <= 0 || ry <= 0) return `M${x} ${y}H${x + w}V${y + h}H${x}Z`;
      return `M${x + rx} ${y}H${x + w - rx}A${rx} ${ry} 0 0 1 ${x + w} ${y + ry}V${y + h - ry}A${rx} ${ry} 0 0 1 ${x + w - rx} ${y + h}H${x + rx}A${rx} ${ry} 0 0 1 ${x} ${y + h - ry}V${y + ry}A${rx} ${ry} 0 0 1 ${x + rx} ${y}Z`;
    }
    case "circle":
    case "ellipse": {
      const cx = num(el, "cx"), cy = num(el, "cy");
      const rx = el.tagName === "circle" ? num(el, "r") : num(el, "rx");
      const ry = el.tagName === "circle" ? rx : num(el, "ry");
      if (!(rx > 0 && ry > 0)) return null;
      return `M${cx - rx} ${cy}A${rx} ${ry} 0 1 0 ${cx + rx} ${cy}A${rx} ${ry} 0 1 0 ${cx - rx} ${cy}Z`;
    }
    case "polygon":
    case "polyline": {
      const pts = (el.getAttribute("points") ?? "").trim();
      if (!pts) return null;
      return `M${pts}${el.tagName === "polygon" ? "Z" : ""}`;
    }
    case "line":
      return `M${num(el, "x1")} ${num(el, "y1")}L${num(el, "x2")} ${num(el, "y2")}`;
  }
  return null;
}

/** Subpaths of a path as point lists (y still down), each marked closed or open. */
function flattenPath(d: string, transform: string, tolerance: number): { points: P[]; closed: boolean }[] {
  let p = svgpath(d);
  if (transform) p = p.transform(transform);
  p = p.abs().unshort();
  const out: { points: P[]; closed: boolean }[] = [];
  let cur: P = [0, 0];
  let start: P = [0, 0];
  let pts: P[] = [];
  const flush = (closed: boolean) => {
    if (pts.length > 1) out.push({ points: pts, closed });
    pts = [];
  };
  p.iterate((seg) => {
    const cmd = seg[0] as string;
    const v = seg.slice(1) as number[];
    switch (cmd) {
      case "M":
        flush(false);
        cur = [v[0], v[1]];
        start = cur;
        pts = [cur];
        break;
      case "L":
        cur = [v[0], v[1]];
        pts.push(cur);
        break;
      case "H":
        cur = [v[0], cur[1]];
        pts.push(cur);
        break;
      case "V":
        cur = [cur[0], v[0]];
        pts.push(cur);
        break;
      case "C": {
        const to: P = [v[4], v[5]];
        pts.push(...cubicPoints(cur, [v[0], v[1]], [v[2], v[3]], to, tolerance).slice(1));
        cur = to;
        break;
      }
      case "Q": {
        // A quadratic is the cubic with control points two thirds of the way to its one control point.
        const c: P = [v[0], v[1]];
        const to: P = [v[2], v[3]];
        const c1: P = [cur[0] + (2 / 3) * (c[0] - cur[0]), cur[1] + (2 / 3) * (c[1] - cur[1])];
        const c2: P = [to[0] + (2 / 3) * (c[0] - to[0]), to[1] + (2 / 3) * (c[1] - to[1])];
        pts.push(...cubicPoints(cur, c1, c2, to, tolerance).slice(1));
        cur = to;
        break;
      }
      case "A": {
        const to: P = [v[5], v[6]];
        pts.push(...svgArcPoints(cur, v[0], v[1], v[2], v[3] !== 0, v[4] !== 0, to, tolerance).slice(1));
        cur = to;
        break;
      }
      case "Z":
        pts.push(start);
        flush(true);
        cur = start;
        pts = [cur];
        break;
    }
  });
  flush(false);
  return out;
}

function svgDeclaredUnit(svg: Element): DrawingUnit | null {
  const width = svg.getAttribute("width") ?? "";
  const m = /^\s*([\d.]+)\s*(mm|in)\s*$/.exec(width);
  const vb = (svg.getAttribute("viewBox") ?? "").trim().split(/[\s,]+/).map(Number);
  if (!m) return null;
  // The declared unit is one user unit only when the viewBox is as wide as the width says (or absent).
  if (vb.length === 4 && Math.abs(vb[2] - parseFloat(m[1])) > 1e-9 * Math.max(1, vb[2])) return null;
  return m[2] as DrawingUnit;
}

export function readSvg(text: string, tolerance: number): DrawingRead {
  const elements = (text.match(/<(path|circle|ellipse|rect|polygon|polyline|line)[\s/>]/g) ?? []).length;
  if (elements > MAX_DRAWING_ENTITIES) {
    throw new DrawingFileError("too-many-entities", `The drawing has more than ${MAX_DRAWING_ENTITIES.toLocaleString("en")} shapes; export only the deck's outlines.`);
  }
  const errors: string[] = [];
  let doc: Document;
  try {
    doc = new DOMParser({
      onError: (level: string, msg: string) => {
        if (level !== "warning") errors.push(msg);
      },
    }).parseFromString(text, "image/svg+xml") as unknown as Document;
  } catch (error) {
    throw new DrawingFileError("malformed", `The SVG file cannot be read: ${String((error as Error).message ?? error).split("\n")[0].slice(0, 200)}.`);
  }
  const svg = doc?.documentElement;
  if (errors.length || !svg || svg.tagName.toLowerCase() !== "svg") {
    throw new DrawingFileError("malformed", `The SVG file cannot be read${errors.length ? `: ${errors[0].split("\n")[0].slice(0, 200)}` : ": it has no <svg> element"}.`);
  }
  const shapes: DrawingShape[] = [];
  const skipped = new Map<string, number>();
  const skip = (what: string) => skipped.set(what, (skipped.get(what) ?? 0) + 1);
  let seq = 0;
  for (const tag of SVG_SHAPES) {
    const list = svg.getElementsByTagName(tag);
    for (let i = 0; i < list.length; i++) {
      const el = list.item(i)!;
      const idAttr = el.getAttribute("id");
      const label = `${tag}${idAttr ? ` "${idAttr}"` : ""}`;
      const transform = transformOf(el);
      // A circle drawn without a transform (or with a plain move) stays an exact circle.
      if (tag === "circle" && (!transform || /^\s*(translate\([^)]*\)\s*)*$/.test(transform))) {
        const r = num(el, "r");
        if (!(r > 0)) {
          skip(`${tag} with no radius`);
          continue;
        }
        const moved = flattenPath(`M${num(el, "cx")} ${num(el, "cy")}h0`, transform, tolerance)[0]?.points[0] ?? [num(el, "cx"), num(el, "cy")];
        shapes.push({ id: `s${++seq}`, source: `circle${idAttr ? ` "${idAttr}"` : ""}, ⌀ ${round(2 * r)}`, layer: idAttr, shape: { kind: "circle", center: [moved[0], -moved[1]], radius: r } });
        continue;
      }
      const d = pathDataOf(el);
      if (!d) {
        skip(`${tag} with no size`);
        continue;
      }
      let subpaths: { points: P[]; closed: boolean }[];
      try {
        subpaths = flattenPath(d, transform, tolerance);
      } catch {
        skip(`${tag} with unreadable path data`);
        continue;
      }
      subpaths.forEach((sp, k) => {
        const ring = tidyRing(sp.points, 1e-9 * Math.max(1, sizeOf(sp.points)));
        if (!sp.closed || ring.length < 3) {
          skip(`open ${tag}`);
          return;
        }
        shapes.push({
          id: `s${++seq}`,
          source: `closed ${label}${subpaths.length > 1 ? ` (part ${k + 1})` : ""}, ${ring.length} points`,
          layer: idAttr,
          shape: { kind: "polygon", points: ring.map(([x, y]) => [x, -y] as P) },
        });
      });
    }
  }
  for (const other of ["text", "image", "use"]) {
    const n = svg.getElementsByTagName(other).length;
    if (n) skipped.set(other, n);
  }
  const notUsed = counted(skipped);
  if (shapes.length === 0) throw noClosed("SVG", notUsed);
  return { format: "svg", shapes, notUsed, declaredUnit: svgDeclaredUnit(svg) };
}

