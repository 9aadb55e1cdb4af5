import type { KitResult, LengthUnits, Study, StudyResult, Vec2 } from "@/geometry";
import { fitState, interferenceRegions } from "../fit";
import { diameterLabel, lengthLabel } from "@/model/units";
import { bounds, outlineRing } from "../outline";
import { portsLayer } from "./ports";
import { dashOf, FIT, patternId } from "@/model/palette";
import { INK, type Attrs, type Drawing, el, hdim, vdim, leader, ringPath, sheet, text, textWidth } from "./svg";

// Plan view at the deck, to scale (1 unit = 1 mm, y up as in the core's frame), drawn from the core's result.

export const STATE_COLOR = { interfere: INK.interfere, tight: INK.tight, clear: INK.clear } as const;

/** The core's frame (y up) to the drawing's (y down). */
export const flip = (p: Vec2): Vec2 => [p[0], -p[1]];
/** A closed path through points in the core's frame. */
export const path = (ring: readonly Vec2[]) => ringPath(ring.map(flip));

// The layers of the case at the deck. The study's plan and the library forms' live drawing both draw
// them, so a case looks the same wherever it is shown; `a` adds attributes (a colour, a data key).

/** The deck face, filled. */
export function deckLayer(ring: readonly Vec2[], a: Attrs = {}): string {
  return el("path", { d: path(ring), fill: INK.paper2, stroke: INK.ink, "stroke-width": 0.4, ...a });
}

/** A pocket or passage in the palette's passage colour, its outline dotted; dashed longer when it starts below the deck. */
export function pocketLayer(ring: readonly Vec2[], startDepthMm: number, a: Attrs = {}): string {
  return el("path", { d: path(ring), fill: INK.passageSoft, stroke: INK.passage, "stroke-width": 0.3, "stroke-dasharray": startDepthMm > 0 ? "1.2 0.8" : dashOf(FIT.passage.shape), "data-layer": "passage", ...a });
}

/** The mouth opening. */
export function mouthLayer(ring: readonly Vec2[], a: Attrs = {}): string {
  return el("path", { d: path(ring), fill: INK.paper, stroke: INK.ink, "stroke-width": 0.3, ...a });
}

/** A stud hole with its centre cross. */
export function studHoleLayer(positionMm: Vec2, radiusMm: number, a: Attrs = {}): string {
  const [x, y] = flip(positionMm);
  return (
    el("circle", { cx: x, cy: y, r: radiusMm, fill: INK.paper, stroke: INK.ink, "stroke-width": 0.3, ...a }) +
    el("path", { d: `M${x - radiusMm - 1} ${y}H${x + radiusMm + 1}M${x} ${y - radiusMm - 1}V${y + radiusMm + 1}`, stroke: INK.ink3, "stroke-width": 0.15 })
  );
}

/** Options of planDrawing. */
export interface PlanOptions {
  /** The scale note in the corner; null leaves it out (for a sheet that shows the drawing scaled down and says so itself). */
  readonly scaleNote?: string | null;
}

/** What the steps of a plan drawing share: the study, the kit's result, the deck's bounds, the text size and where things go. */
interface PlanPen {
  readonly study: Study;
  readonly k: KitResult;
  readonly units: LengthUnits;
  /** The deck's bounds in the core's frame. */
  readonly b: { minX: number; minY: number; maxX: number; maxY: number };
  readonly fs: number;
  /** The fit state's colour of the skirt. */
  readonly color: string;
  /** The skirt's centre, in the drawing's frame. */
  readonly sc: Vec2;
  readonly body: string[];
}

/** The x of a label column outside the deck, right or left. */
const outerX = ({ b, fs }: PlanPen, right: boolean) => (right ? b.maxX + fs * 2 : b.minX - fs * 2);

/** The case at the deck (deck, pockets, ports, mouth, stud holes) and the interference at the deck, solid red, cross-hatched so it reads in black and white. */
function drawCase({ study, k, fs, body }: PlanPen, kitIndex: number) {
  const cs = study.case;
  body.push(deckLayer(outlineRing(cs.deck)));
  for (const p of cs.pockets) body.push(pocketLayer(outlineRing(p.outline), p.startDepthMm));
  body.push(portsLayer(study, kitIndex, k, fs));
  body.push(mouthLayer(outlineRing(cs.mouth.outline)));
  for (const s of cs.studs) body.push(studHoleLayer(s.positionMm, cs.studHoleDiameterMm / 2));
  const band = interferenceRegions(study, k)[0];
  if (band && band.z0 === 0) {
    for (const r of band.regions) {
      const d = path(r.outer) + r.holes.map(path).join("");
      body.push(el("path", { d, fill: INK.interfere, "fill-opacity": 0.45, "fill-rule": "evenodd", "data-layer": "interference" }));
      body.push(el("path", { d, fill: `url(#${patternId(FIT.interfere)})`, "fill-rule": "evenodd" }));
    }
  }
}

/** The planned cut, the skirt in its fit state's colour with its centre cross, and the leaders naming the cut, the skirt and the mouth. */
function drawCutAndSkirt(pen: PlanPen) {
  const { study, k, units, b, fs, color, sc, body } = pen;
  const mouth = study.case.mouth.outline;
  const sr = k.skirt.diameterMm / 2;
  if (k.cut) {
    const cc = flip(k.cut.centerAtDeckMm);
    body.push(el("circle", { cx: cc[0], cy: cc[1], r: k.cut.diameterMm / 2, fill: INK.counterbore, "fill-opacity": 0.08, stroke: INK.counterbore, "stroke-width": 0.35, "stroke-dasharray": dashOf(FIT.counterbore.shape), "data-layer": "counterbore" }));
  }
  body.push(el("circle", { cx: sc[0], cy: sc[1], r: sr, fill: "none", stroke: color, "stroke-width": 0.5 }));
  body.push(el("path", { d: `M${sc[0] - 4} ${sc[1]}H${sc[0] + 4}M${sc[0]} ${sc[1] - 4}V${sc[1] + 4}`, stroke: INK.ink2, "stroke-width": 0.15 }));

  const at = (r: number, deg: number, c: Vec2 = sc): Vec2 => [c[0] + r * Math.cos((deg * Math.PI) / 180), c[1] - r * Math.sin((deg * Math.PI) / 180)];
  const lead = (r: number, deg: number, label: string, col: string, row: number) => {
    const from = at(r, deg);
    const right = Math.cos((deg * Math.PI) / 180) >= 0;
    const up = Math.sin((deg * Math.PI) / 180) >= 0;
    const y = (up ? -b.maxY + fs * 1.6 * row : -b.minY - fs * 1.6 * row);
    body.push(leader(from, [outerX(pen, right), y], label, fs, col));
  };
  if (k.cut) lead(k.cut.diameterMm / 2, 68, `cut ${diameterLabel(k.cut.diameterMm, units)}`, INK.counterbore, 1);
  lead(sr, 112, `skirt ${diameterLabel(k.skirt.diameterMm, units)}`, color, 1);
  if (mouth.kind === "circle") lead(mouth.diameterMm / 2, 250, `mouth ${diameterLabel(mouth.diameterMm, units)}`, INK.ink, 1);
  else lead(0, 250, "mouth (outline as profiled)", INK.ink, 1);
}

/** The thinnest wall the cut leaves, marked and named below the deck; a wall below the minimum in the palette's colour, thick and dashed. */
function drawThinnestWall(pen: PlanPen) {
  const { k, units, b, fs, sc, body } = pen;
  const w = k.thinnestWall;
  if (!w || !k.cut) return;
  const p = flip(w.cutPointMm), q = flip(w.atMm);
  const wc = w.ok ? INK.ink : INK.wallLow;
  body.push(el("line", { x1: p[0], y1: p[1], x2: q[0], y2: q[1], stroke: wc, "stroke-width": w.ok ? 0.6 : 1.1, "stroke-dasharray": w.ok ? undefined : dashOf(FIT.wallLow.shape), "data-layer": w.ok ? "wall" : "wall-low" }));
  const right = q[0] >= sc[0];
  const to: [number, number] = [outerX(pen, right), -b.minY + fs * 2.2];
  body.push(leader(q, to, `thinnest wall ${lengthLabel(w.minWallMm, units)}`, fs, wc));
  body.push(text(to[0] + (right ? 0.5 : -0.5), to[1] + fs * 1.1, w.label, fs * 0.9, { "text-anchor": right ? "start" : "end", fill: wc }));
}

/** The stud pattern's spans dimensioned, and below the deck the drawing's title and each stud's centre in words. */
function drawStuds({ study, k, units, b, fs, body }: PlanPen, minX: number) {
  const studs = study.case.studs;
  const xs = studs.map((s) => s.positionMm[0]), ys = studs.map((s) => s.positionMm[1]);
  const sx0 = Math.min(...xs), sx1 = Math.max(...xs), sy0 = Math.min(...ys), sy1 = Math.max(...ys);
  const topStud = studs.reduce((m, s) => (s.positionMm[1] > m.positionMm[1] ? s : m));
  const stY = -topStud.positionMm[1];
  if (sx1 - sx0 > 1) body.push(hdim(sx0, sx1, -b.maxY - fs * 2, stY, stY, `studs ${lengthLabel(sx1 - sx0, units)}`, fs));
  if (sy1 - sy0 > 1) body.push(vdim(b.maxX + fs * 2, -sy1, -sy0, sx1, lengthLabel(sy1 - sy0, units), fs));
  let ty = -b.minY + fs * 6.2;
  body.push(text(minX + fs, ty, `Plan at the deck — ${k.name}`, fs * 1.1, { "font-weight": 600 }));
  ty += fs * 1.5;
  body.push(text(minX + fs, ty, `Stud centres from the cylinder axis (x right, y up):`, fs * 0.9, { fill: INK.ink2 }));
  for (const s of studs) {
    ty += fs * 1.3;
    body.push(text(minX + fs * 2, ty, `${s.label}: x ${lengthLabel(s.positionMm[0], units)}, y ${lengthLabel(s.positionMm[1], units)}`, fs * 0.9, { class: "num" }));
  }
}

/** The plan drawing of one kit of a study: deck, mouth, pockets, stud holes, the planned cut, the skirt, the interference at the deck and the thinnest wall, dimensioned. */
export function planDrawing(study: Study, result: StudyResult, kitIndex: number, units: LengthUnits, options: PlanOptions = {}): Drawing {
  const cs = study.case;
  const k = result.kits[kitIndex];
  const b = bounds([outlineRing(cs.deck)]);
  const fs = Math.max(2.6, (b.maxX - b.minX) / 34);
  const pen: PlanPen = { study, k, units, b, fs, color: STATE_COLOR[fitState(k, result)], sc: flip(k.skirt.centerMm), body: [] };
  // Room beside the deck for the longest label a leader may carry.
  const w0 = k.thinnestWall;
  const longest = [`thinnest wall ${lengthLabel(w0?.minWallMm ?? 0, units)}`, w0?.label ?? "", `skirt ${diameterLabel(k.skirt.diameterMm, units)}`, "mouth (outline as profiled)"];
  const margin = Math.max(...longest.map((t) => textWidth(t, fs))) + fs * 4;
  const minX = b.minX - margin, maxX = b.maxX + margin;
  const minY = -b.maxY - fs * 7, maxY = -b.minY + fs * (8 + cs.studs.length * 1.3);

  drawCase(pen, kitIndex);
  drawCutAndSkirt(pen);
  drawThinnestWall(pen);
  drawStuds(pen, minX);
  const scaleNote = options.scaleNote === undefined ? "1:1 when printed at 100 %" : options.scaleNote;
  if (scaleNote) pen.body.push(text(maxX - fs, -b.maxY - fs * 5.5, scaleNote, fs * 0.85, { "text-anchor": "end", fill: INK.ink2 }));
  return sheet(`Plan at the deck: ${k.name}`, minX, minY, maxX - minX, maxY - minY, pen.body.join(""));
}
