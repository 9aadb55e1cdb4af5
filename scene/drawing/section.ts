import type { CylinderKit, KitResult, LengthUnits, Study, StudyResult } from "@/geometry";
import { FLANGE_DRAWN_MM, fitState, flangeRadiusMm, interferenceRegions } from "../fit";
import { diameterLabel, lengthLabel, signedLengthLabel } from "@/model/units";
import { circleRing, intersectIntervals, lineIntervals, outlineRing, subtractIntervals } from "../outline";
import { STATE_COLOR } from "./plan";
import { dashOf, FIT, patternId } from "@/model/palette";
import { INK, type Attrs, type Drawing, el, hdim, vdim, textWidth, sheet, text } from "./svg";

// Section through the cylinder axis along x (the plane y = skirt centre), to scale: x to the right,
// depth below the deck downward. Case material hatched, the material the planned cut removes dotted inside the
// counterbore's dashed outline, skirt and flange above.

type Iv = [number, number][];

/** Options of sectionDrawing. */
export interface SectionOptions {
  /** A small drawing without dimension lines, for side-by-side kits. */
  readonly compact?: boolean;
}

/** What the steps of a section drawing share: the study and kit, the section's plane and span, the text size, the markup. */
interface SectionPen {
  readonly study: Study;
  readonly k: KitResult;
  readonly units: LengthUnits;
  /** The fit state's colour of the skirt. */
  readonly color: string;
  /** The section's plane (y of the skirt's centre) and the skirt's centre along x. */
  readonly y0: number;
  readonly cx: number;
  /** The mouth's depth. */
  readonly M: number;
  /** The deck along the plane, and its ends. */
  readonly deckIv: Iv;
  readonly x0: number;
  readonly x1: number;
  readonly fs: number;
  readonly body: string[];
}

const rect = (a: number, b: number, z0: number, z1: number, attrs: Attrs) => el("rect", { x: a, y: z0, width: b - a, height: z1 - z0, ...attrs });

/** The case material hatched level by level (a pocket starting below the deck opens a level), the material the cut takes away dotted in the palette's removed-material colour, and the mouth's bottom. */
function drawMaterial({ study, k, y0, M, deckIv, x0, x1, body }: SectionPen, cutIv: Iv) {
  const cs = study.case;
  const levels = [...new Set([0, ...cs.pockets.map((p) => p.startDepthMm).filter((z) => z > 0 && z < M), M])].sort((a, b) => a - b);
  const voidsAt = (z: number): Iv => [
    ...lineIntervals(outlineRing(cs.mouth.outline), y0),
    ...cs.studs.flatMap((s) => lineIntervals(circleRing(s.positionMm, cs.studHoleDiameterMm / 2, 64), y0)),
    ...cs.pockets.filter((p) => p.startDepthMm <= z + 1e-9).flatMap((p) => lineIntervals(outlineRing(p.outline), y0)),
  ];
  for (let i = 0; i + 1 < levels.length; i++) {
    const material = subtractIntervals(deckIv, voidsAt(levels[i]));
    for (const [a, b] of material) {
      body.push(rect(a, b, levels[i], levels[i + 1], { fill: "url(#hatch)", stroke: INK.ink, "stroke-width": 0.3 }));
    }
    const z1 = Math.min(levels[i + 1], k.cut?.depthMm ?? 0);
    if (z1 > levels[i]) {
      for (const [a, b] of intersectIntervals(material, cutIv)) {
        body.push(rect(a, b, levels[i], z1, { fill: INK.removed, "fill-opacity": 0.18, "data-layer": "removed" }));
        body.push(rect(a, b, levels[i], z1, { fill: `url(#${patternId(FIT.removed)})` }));
      }
    }
  }
  body.push(el("line", { x1: x0 - 4, y1: M, x2: x1 + 4, y2: M, stroke: INK.ink3, "stroke-width": 0.15, "stroke-dasharray": "1 1" }));
}

/** The counterbore's dashed outline and the interference along the plane, solid red, cross-hatched so it reads in black and white. */
function drawCutAndInterference({ study, k, y0, x0, x1, body }: SectionPen, cutIv: Iv) {
  if (k.cut) {
    for (const [a, b] of cutIv) body.push(rect(a, b, 0, k.cut.depthMm, { fill: "none", stroke: INK.counterbore, "stroke-width": 0.35, "stroke-dasharray": dashOf(FIT.counterbore.shape), "data-layer": "counterbore" }));
  }
  for (const band of interferenceRegions(study, k)) {
    const iv: Iv = band.regions.flatMap((r) => subtractIntervals(lineIntervals(r.outer, y0), r.holes.flatMap((h) => lineIntervals(h, y0))));
    for (const [a, b] of intersectIntervals(iv, [[x0, x1]])) {
      body.push(rect(a, b, band.z0, band.z1, { fill: INK.interfere, "fill-opacity": 0.6, "data-layer": "interference" }));
      body.push(rect(a, b, band.z0, band.z1, { fill: `url(#${patternId(FIT.interfere)})` }));
    }
  }
}

/** The skirt below the deck, the flange (drawn schematically) and the base gasket above it, and the axis; returns the flange's top. */
function drawSkirtAndFlange({ study, k, color, cx, M, body }: SectionPen, kit: CylinderKit): number {
  const r = k.skirt.diameterMm / 2;
  const inner = Math.min(kit.boreMm / 2, r - 0.5);
  const P = k.skirt.protrusionMm;
  const g = k.skirt.gasketMm;
  const Rf = flangeRadiusMm(kit, k, study.case.studHoleDiameterMm);
  const top = -g - FLANGE_DRAWN_MM;
  if (P > 0) for (const [a, b] of [[cx - r, cx - inner], [cx + inner, cx + r]]) body.push(rect(a, b, 0, P, { fill: color, "fill-opacity": 0.22, stroke: color, "stroke-width": 0.4 }));
  for (const [a, b] of [[cx - Rf, cx - inner], [cx + inner, cx + Rf]]) body.push(rect(a, b, top, -g, { fill: INK.rule, stroke: INK.ink2, "stroke-width": 0.3 }));
  if (g > 0) for (const [a, b] of [[cx - Rf, cx - r], [cx + r, cx + Rf]]) body.push(rect(a, b, -g, 0, { fill: INK.gasket, "fill-opacity": 0.6 }));
  body.push(el("line", { x1: cx, y1: top - 4, x2: cx, y2: M + 4, stroke: INK.ink3, "stroke-width": 0.18, "stroke-dasharray": "4 1 1 1" }));
  return top;
}

/** The cut, mouth and skirt dimensioned and the notes below (title, depth clearance, gasket); returns the drawing's bottom. */
function drawDimensions({ study, k, units, color, cx, M, x0, x1, fs, body }: SectionPen, top: number, minX: number): number {
  const mouth = study.case.mouth.outline;
  const r = k.skirt.diameterMm / 2;
  const P = k.skirt.protrusionMm;
  const g = k.skirt.gasketMm;
  if (k.cut) {
    const R = k.cut.diameterMm / 2;
    body.push(vdim(x1 + fs * 2, 0, k.cut.depthMm, cx + R, `cut depth ${lengthLabel(k.cut.depthMm, units)}`, fs, INK.counterbore));
    body.push(hdim(cx - R, cx + R, M + fs * 2.5, k.cut.depthMm, k.cut.depthMm, `cut ${diameterLabel(k.cut.diameterMm, units)}`, fs, INK.counterbore));
  }
  if (mouth.kind === "circle") {
    const R = mouth.diameterMm / 2;
    body.push(hdim(cx - R, cx + R, M + fs * 5, M, M, `mouth ${diameterLabel(mouth.diameterMm, units)}`, fs));
  }
  if (P > 0) body.push(vdim(x0 - fs * 2, 0, P, cx - r, `skirt ${lengthLabel(P, units)} below deck`, fs, color));
  body.push(hdim(cx - r, cx + r, top - fs * 2, top, top, `skirt ${diameterLabel(k.skirt.diameterMm, units)}`, fs, color));
  const bottomY = M + fs * 8;
  const lines = [
    `Section through the axis along x — ${k.name}`,
    k.depthClearanceMm === null ? "depth: the cut leaves no step" : `depth clearance ${signedLengthLabel(k.depthClearanceMm, units)} (skirt bottom to the cut's shallowest point)`,
    g > 0 ? `base gasket ${lengthLabel(g, units)} counted; flange drawn schematically` : "no base gasket counted; flange drawn schematically",
  ];
  lines.forEach((l, i) => body.push(text(minX + fs, bottomY + fs * 1.5 * i, l, i ? fs * 0.9 : fs * 1.1, { "font-weight": i ? 400 : 600, fill: i ? INK.ink2 : INK.ink })));
  return bottomY + fs * 4.5;
}

/** The section drawing of one kit of a study, dimensioned (cut diameter and depth, mouth, skirt, protrusion, depth clearance). */
export function sectionDrawing(study: Study, result: StudyResult, kitIndex: number, units: LengthUnits, options: SectionOptions = {}): Drawing {
  const cs = study.case;
  const k = result.kits[kitIndex];
  const y0 = k.skirt.centerMm[1];
  const M = cs.mouth.depthMm;
  const deckIv = lineIntervals(outlineRing(cs.deck), y0);
  const x0 = Math.min(...deckIv.map((i) => i[0])), x1 = Math.max(...deckIv.map((i) => i[1]));
  const fs = options.compact ? Math.max(3.4, (x1 - x0) / 20) : Math.max(2.6, (x1 - x0) / 34);
  const pen: SectionPen = { study, k, units, color: STATE_COLOR[fitState(k, result)], y0, cx: k.skirt.centerMm[0], M, deckIv, x0, x1, fs, body: [] };
  const cutIv: Iv = k.cut ? lineIntervals(circleRing(k.cut.centerAtDeckMm, k.cut.diameterMm / 2), y0) : [];

  drawMaterial(pen, cutIv);
  drawCutAndInterference(pen, cutIv);
  const top = drawSkirtAndFlange(pen, study.kits[kitIndex]);
  const side = options.compact ? fs * 2 : Math.max(textWidth(`cut depth ${lengthLabel(M, units)}`, fs), textWidth(`skirt ${lengthLabel(M, units)} below deck`, fs)) + fs * 4;
  const minX = x0 - side, maxX = x1 + side;
  const bottomY = options.compact ? M + fs * 2 : drawDimensions(pen, top, minX);
  if (options.compact) pen.body.push(text(pen.cx, M + fs * 1.6, k.name, fs, { "text-anchor": "middle", "font-weight": 600 }));
  const minY = top - fs * (options.compact ? 2 : 6);
  return sheet(`Section through the axis: ${k.name}`, minX, minY, maxX - minX, bottomY - minY, pen.body.join(""));
}
