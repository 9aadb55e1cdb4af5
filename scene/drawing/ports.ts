import type { KitResult, LengthUnits, Study } from "@/geometry";
import { lengthLabel } from "@/model/units";
import { outlineRing } from "../outline";
import { dashOf, FIT } from "@/model/palette";
import { INK, el, ringPath, text } from "./svg";

// The port overlay on the plan at the deck: the kit's base-gasket port windows drawn over the case's passages,
// each labelled with the figures the core returned for it. Nothing here measures anything.

/** A signed length for a step: "+1.00 mm" where the passage is narrower than the port. */
function stepLabel(v: number | null, units: LengthUnits): string {
  if (v === null) return "—";
  return `${v > 0 ? "+" : ""}${lengthLabel(v, units)}`;
}

/** One line of words for a port: its passage, the steps at its inner, outer and side edges, and the matched-passage wall. */
export function portCaption(p: KitResult["ports"][number], units: LengthUnits): string {
  const s = p.steps;
  const over = p.pocketLabel ? `over ${p.pocketLabel}` : "over no passage";
  const steps = p.pocketLabel ? `; steps in ${stepLabel(s.innerMm, units)}, out ${stepLabel(s.outerMm, units)}, sides ${stepLabel(s.ccwMm, units)} / ${stepLabel(s.cwMm, units)}` : "";
  const wall = p.matchedWallMm === null ? "" : `; matched wall ${lengthLabel(p.matchedWallMm, units)}`;
  return `${p.portLabel} ${over}${steps}${wall}`;
}

/**
 * The SVG markup of the kit's port windows in the plan's frame (y flipped to the drawing's, 1 unit = 1 mm):
 * each window outlined dash-dotted in the palette's port colour, or in its wall-below-minimum colour where the
 * matched passage would leave too little wall,
 * with its label at its centroid. Empty when the kit has no base gasket.
 */
export function portsLayer(study: Study, kitIndex: number, result: KitResult, fontMm: number): string {
  const windows = study.kits[kitIndex]?.baseGasket?.ports ?? [];
  const out: string[] = [];
  for (const w of windows) {
    const r = result.ports.find((p) => p.portLabel === w.label);
    const color = r?.ok === false ? INK.wallLow : INK.port;
    const ring = outlineRing(w.outline).map(([x, y]) => [x, -y] as const);
    out.push(el("path", { d: ringPath(ring), fill: color, "fill-opacity": 0.12, stroke: color, "stroke-width": 0.35, "stroke-dasharray": dashOf(FIT.port.shape), "data-port": w.label }));
    if (r) out.push(text(r.centroidMm[0], -r.centroidMm[1] + fontMm * 0.3, w.label, fontMm * 0.7, { "text-anchor": "middle", fill: color }));
  }
  return out.length ? el("g", { "aria-label": "port windows of the base gasket" }, out.join("")) : "";
}
